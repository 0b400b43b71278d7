#!/usr/bin/env node
// `npm run seed:bulk -- 10000`: adds that many invented jobs (and a third as many owners and
// bikes) to the first demo shop of the local database, to try the app at a busy shop's size.
// Run after `npm run build`, with the server stopped.
import Database from 'better-sqlite3';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const require = createRequire(import.meta.url);
const { seedBulkRecords } = require(resolve(root, 'dist/apps/api/apps/api/src/seed/bulk-records.js'));
const jobs = Number(process.argv[2] ?? 10_000);
const sqlite = new Database(process.env.DATABASE_PATH ?? resolve(root, 'data/benchproof.sqlite'));
seedBulkRecords(sqlite, 1, { customers: Math.ceil(jobs / 3), jobs });
sqlite.pragma('optimize');
sqlite.close();
console.log(`Added ${jobs} jobs to shop 1.`);
