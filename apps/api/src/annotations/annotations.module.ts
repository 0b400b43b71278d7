import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { ImageModule } from '../infra/image';
import { StorageModule } from '../infra/storage';
import { InspectionModule } from '../inspection';
import { MediaModule } from '../media';
import { AnnotationFilesService } from './annotation-files.service';
import { AnnotationRenderService } from './annotation-render.service';
import { AnnotationsController } from './annotations.controller';
import { AnnotationsRepository } from './annotations.repository';
import { AnnotationsService } from './annotations.service';

@Module({
  imports: [AuditModule, MediaModule, InspectionModule, StorageModule, ImageModule],
  controllers: [AnnotationsController],
  providers: [AnnotationsRepository, AnnotationsService, AnnotationRenderService, AnnotationFilesService],
  exports: [AnnotationRenderService],
})
export class AnnotationsModule {}
