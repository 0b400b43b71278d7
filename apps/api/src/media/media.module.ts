import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { AuditModule } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { FindingsModule } from '../findings';
import { ImageModule } from '../infra/image';
import { FileSniffer, SNIFFER } from '../infra/sniff';
import { StorageModule, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { VIDEO_PROBE, VideoProbe } from '../infra/video';
import { JobsModule } from '../jobs';
import { MediaDerivativesService } from './media-derivatives.service';
import { MediaFilesController } from './media-files.controller';
import { MediaFileCache } from './media-file-cache';
import { MediaFilesService } from './media-files.service';
import { MediaIntakeService } from './media-intake.service';
import { MediaPhashService } from './media-phash.service';
import { MediaTusController } from './media-tus.controller';
import { MediaTusService } from './media-tus.service';
import { MediaUploadService } from './media-upload.service';
import { MediaController } from './media.controller';
import { MediaRepository } from './media.repository';
import { MediaService } from './media.service';
import { MediaSweepService } from './media-sweep.service';
import { MAX_FILES_PER_BATCH } from './upload-form';

@Module({
  imports: [
    AuditModule,
    JobsModule,
    FindingsModule,
    StorageModule,
    ImageModule,
    MulterModule.registerAsync({
      inject: [UPLOAD_TEMP, APP_CONFIG],
      useFactory: (temp: UploadTemp, cfg: AppConfig) => temp.multerOptions(Math.max(cfg.MAX_PHOTO_BYTES, cfg.MAX_VIDEO_BYTES), MAX_FILES_PER_BATCH),
    }),
  ],
  // The tus controller first: its /media/tus/:uploadId must win over /media/:id/:variant.
  controllers: [MediaTusController, MediaFilesController, MediaController],
  providers: [
    MediaRepository,
    MediaService,
    MediaIntakeService,
    MediaUploadService,
    MediaDerivativesService,
    MediaPhashService,
    MediaFilesService,
    { provide: MediaFileCache, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new MediaFileCache(cfg.MEDIA_CACHE_MB * 1024 * 1024, 1024 * 1024) },
    MediaTusService,
    MediaSweepService,
    { provide: SNIFFER, useClass: FileSniffer },
    { provide: VIDEO_PROBE, useClass: VideoProbe },
  ],
  exports: [MediaService, MediaIntakeService, MediaDerivativesService, MediaFilesService],
})
export class MediaModule {}
