export { DB, SQLITE, type Db } from './db.types';
export { DbModule } from './db.module';
export { openDb, MIGRATIONS_DIR } from './open-db';
export { ftsPrefixQuery } from './fts';
export { PreparedPages } from './prepared-shapes';
export { openReadSnapshot } from './read-snapshot';
