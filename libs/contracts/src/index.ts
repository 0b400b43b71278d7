export * from './errors';
export * from './audit';
export * from './auth';
export * from './users';
export * from './shops';
