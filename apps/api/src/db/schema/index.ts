export * from './shops.table';
export * from './users.table';
export * from './audit-events.table';
