import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import type Database from 'better-sqlite3';
import { APP_CONFIG, type AppConfig } from '../../config';
import { DB } from './db.types';
import { openDb } from './open-db';
import { UnitOfWork } from './unit-of-work';

const SQLITE = Symbol('SQLITE');

@Global()
@Module({
  providers: [
    { provide: SQLITE, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => openDb(cfg.DATABASE_PATH) },
    { provide: DB, inject: [SQLITE], useFactory: (opened: ReturnType<typeof openDb>) => opened.db },
    UnitOfWork,
  ],
  exports: [DB, UnitOfWork],
})
export class DbModule implements OnApplicationShutdown {
  /** Re-gathers planner statistics as tables grow (SQLite: run PRAGMA optimize every few hours). */
  private readonly optimizer = setInterval(() => this.opened.sqlite.pragma('optimize'), 3 * 3600_000).unref();

  constructor(@Inject(SQLITE) private readonly opened: { sqlite: Database.Database }) {}

  onApplicationShutdown(): void {
    clearInterval(this.optimizer);
    this.opened.sqlite.close();
  }
}
