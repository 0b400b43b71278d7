import { Global, Inject, Injectable, Module, type OnApplicationShutdown } from '@nestjs/common';
import { Interval } from '@nestjs/schedule';
import type Database from 'better-sqlite3';
import { APP_CONFIG, type AppConfig } from '../../config';
import { DB, SQLITE } from './db.types';
import { openDb } from './open-db';
import { UnitOfWork } from './unit-of-work';

/** Periodic upkeep of the database, on @nestjs/schedule. */
@Injectable()
export class DbMaintenance {
  constructor(@Inject(SQLITE) private readonly opened: { sqlite: Database.Database }) {}

  /** Re-gathers planner statistics as tables grow (SQLite: run PRAGMA optimize every few hours). */
  @Interval('sqlite-optimize', 3 * 3600_000)
  optimize(): void {
    if (this.opened.sqlite.open) this.opened.sqlite.pragma('optimize');
  }
}

@Global()
@Module({
  providers: [
    { provide: SQLITE, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => openDb(cfg.DATABASE_PATH) },
    { provide: DB, inject: [SQLITE], useFactory: (opened: ReturnType<typeof openDb>) => opened.db },
    UnitOfWork,
    DbMaintenance,
  ],
  exports: [DB, SQLITE, UnitOfWork],
})
export class DbModule implements OnApplicationShutdown {
  constructor(@Inject(SQLITE) private readonly opened: { sqlite: Database.Database }) {}

  onApplicationShutdown(): void {
    this.opened.sqlite.close();
  }
}
