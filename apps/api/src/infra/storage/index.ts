export { STORAGE, assertSafeKey, type Storage, type StoredObject, type ByteRange, type PutOptions, type AdoptOptions } from './storage';
export { LocalDiskStorage } from './local-disk.storage';
export { UPLOAD_TEMP, UploadTemp } from './upload-temp';
export { StorageModule } from './storage.module';
export { removeLeftovers } from './leftovers';
