import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { LocalDiskStorage } from './local-disk.storage';
import { STORAGE } from './storage';
import { UPLOAD_TEMP, UploadTemp } from './upload-temp';

/** The storage seam: local disk today; an S3 implementation would be chosen here from configuration. */
@Global()
@Module({
  providers: [
    { provide: STORAGE, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new LocalDiskStorage(cfg.UPLOADS_DIR) },
    { provide: UPLOAD_TEMP, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new UploadTemp(cfg.UPLOADS_DIR) },
  ],
  exports: [STORAGE, UPLOAD_TEMP],
})
export class StorageModule {}
