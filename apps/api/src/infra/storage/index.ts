export { STORAGE, assertSafeKey, type Storage, type StoredObject, type ListedObject, type ByteRange, type PutOptions, type AdoptOptions } from './storage';
export { LocalDiskStorage } from './local-disk.storage';
export { S3Storage } from './s3.storage';
export { createStorage } from './storage.module';
export { hashing, hashFile } from './hashing';
export { UPLOAD_TEMP, UploadTemp } from './upload-temp';
export { StorageModule } from './storage.module';
export { removeLeftovers } from './leftovers';
export { storageErrorRows } from './storage-errors';
