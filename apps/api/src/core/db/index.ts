export { DB, SQLITE, type Db, type DbTx } from './db.types';
export { DbModule } from './db.module';
export { UnitOfWork } from './unit-of-work';
export { openDb, MIGRATIONS_DIR } from './open-db';
export { ftsPrefixQuery } from './fts';
export { PreparedPages } from './prepared-shapes';
export { openReadSnapshot } from './read-snapshot';
