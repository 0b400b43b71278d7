import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { JobsModule } from '../jobs';
import { MediaModule } from '../media';
import { PairsController } from './pairs.controller';
import { PairsRepository } from './pairs.repository';
import { PairsService } from './pairs.service';

@Module({
  imports: [AuditModule, JobsModule, MediaModule],
  controllers: [PairsController],
  providers: [PairsRepository, PairsService],
  exports: [PairsService],
})
export class PairsModule {}
