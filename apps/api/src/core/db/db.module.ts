import { Global, Inject, Injectable, Module, type OnApplicationShutdown, Optional } from '@nestjs/common';
import { Interval } from '@nestjs/schedule';
import type Database from 'better-sqlite3';
import { APP_CONFIG, type AppConfig } from '../../config';
import { everyTick, TICK_GATE, type TickGate } from '../schedule';
import { DB, SQLITE } from './db.types';
import { openDb } from './open-db';
import { UnitOfWork } from './unit-of-work';

const OPTIMIZE_EVERY_MS = 3 * 3600_000;

/** Periodic upkeep of the database, on @nestjs/schedule; with several processes one of them does each tick (TICK_GATE). */
@Injectable()
export class DbMaintenance {
  constructor(
    @Inject(SQLITE) private readonly opened: { sqlite: Database.Database },
    @Optional() @Inject(TICK_GATE) private readonly gate: TickGate = everyTick,
  ) {}

  /** Re-gathers planner statistics as tables grow (SQLite: run PRAGMA optimize every few hours). */
  @Interval('sqlite-optimize', OPTIMIZE_EVERY_MS)
  async optimize(): Promise<void> {
    if (!(await this.gate.claim('sqlite-optimize', OPTIMIZE_EVERY_MS))) return;
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
