import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { LocalDiskStorage } from './local-disk.storage';
import { S3Storage } from './s3.storage';
import { countingStorage } from './storage-errors';
import { STORAGE, type Storage } from './storage';
import { UPLOAD_TEMP, UploadTemp } from './upload-temp';

/** Picks the store from configuration; uploads always arrive in local scratch space first (UploadTemp). */
export function createStorage(cfg: AppConfig): Storage {
  return countingStorage(createStore(cfg));
}

function createStore(cfg: AppConfig): Storage {
  if (cfg.STORAGE === 'local') return new LocalDiskStorage(cfg.UPLOADS_DIR);
  const credentials =
    cfg.S3_ACCESS_KEY_ID && cfg.S3_SECRET_ACCESS_KEY ? { accessKeyId: cfg.S3_ACCESS_KEY_ID, secretAccessKey: cfg.S3_SECRET_ACCESS_KEY } : undefined;
  return new S3Storage({
    bucket: cfg.S3_BUCKET ?? '',
    region: cfg.S3_REGION,
    endpoint: cfg.S3_ENDPOINT,
    forcePathStyle: cfg.S3_FORCE_PATH_STYLE,
    credentials,
  });
}

/** The storage seam: local disk by default, an S3-compatible bucket with STORAGE=s3. */
@Global()
@Module({
  providers: [
    { provide: STORAGE, inject: [APP_CONFIG], useFactory: createStorage },
    { provide: UPLOAD_TEMP, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new UploadTemp(cfg.UPLOADS_DIR) },
  ],
  exports: [STORAGE, UPLOAD_TEMP],
})
export class StorageModule {}
