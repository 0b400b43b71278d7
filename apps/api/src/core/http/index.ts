export { DomainError, notFound } from './domain-error';
export { ErrorFilter } from './error.filter';
export { ZodPipe, ZodBody, ZodQuery, ZodParam, ApiZodForm } from './zod';
export { sendFile, type FileToSend, type FileStatus } from './file-answer';
export { isStorageFull, domainErrorOf } from './storage-full';
export { drainOnSignals } from './drain';
