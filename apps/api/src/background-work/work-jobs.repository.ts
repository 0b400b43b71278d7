import { Inject, Injectable } from '@nestjs/common';
import { and, eq } from 'drizzle-orm';
import type { SQLiteColumn, SQLiteTable } from 'drizzle-orm/sqlite-core';
import { DB, type Db } from '../core/db';
import { jobs, mediaAssets, outboxMessages, reports } from '../db/schema';

export interface WorkJob {
  jobId: number;
  jobNumber: string;
}

/** The leading id of a task key: an asset id ('12', or '12:v3' for an annotation render) or a report id. */
const leadingId = (key: string): number | null => {
  const m = /^(\d+)/.exec(key);
  return m ? Number(m[1]) : null;
};

interface Source {
  table: SQLiteTable;
  shop: SQLiteColumn;
  match: SQLiteColumn;
  job: SQLiteColumn;
  value: (key: string) => number | string | null;
}

const asset: Source = { table: mediaAssets, shop: mediaAssets.shopId, match: mediaAssets.id, job: mediaAssets.jobId, value: leadingId };

/** Where each kind's key leads (task-kinds.ts names what each key is); kinds missing here belong to no job. */
const SOURCES: Record<string, Source> = {
  'media.derivatives': asset,
  'media.phash': asset,
  'annotation.render': asset,
  'report.render': { table: reports, shop: reports.shopId, match: reports.id, job: reports.jobId, value: leadingId },
  'mail.send': { table: outboxMessages, shop: outboxMessages.shopId, match: outboxMessages.taskKey, job: outboxMessages.jobId, value: (k) => k },
};

/**
 * Which job a failed task belongs to, from its kind and key, so the manager reads "Job 2026-0042" instead of a
 * key. Read-only, and every look-up is scoped by shop.
 */
@Injectable()
export class WorkJobsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  jobOf(shopId: number, kind: string, key: string): WorkJob | null {
    const src = SOURCES[kind];
    const value = src?.value(key) ?? null;
    if (!src || value === null) return null;
    const row = this.db
      .select({ jobId: jobs.id, jobNumber: jobs.number })
      .from(src.table)
      .innerJoin(jobs, and(eq(jobs.id, src.job), eq(jobs.shopId, shopId)))
      .where(and(eq(src.shop, shopId), eq(src.match, value)))
      .all()[0];
    return row ?? null;
  }
}
