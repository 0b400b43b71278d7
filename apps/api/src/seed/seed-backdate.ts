import { sql } from 'drizzle-orm';
import type { Db } from '../core/db';

const DAY_MS = 86_400_000;

/** Rows of a job that carry times, with their time columns. Past demo visits are moved back as a whole. */
const TIME_COLUMNS: Record<string, string[]> = {
  jobs: [
    'booked_in_at',
    'on_stand_at',
    'waiting_owner_at',
    'in_work_at',
    'final_check_at',
    'ready_at',
    'collected_at',
    'cancelled_at',
    'created_at',
    'updated_at',
  ],
  job_status_events: ['at'],
  checkpoints: ['inspected_at'],
  measurements: ['at'],
  findings: ['created_at', 'updated_at'],
  recommendations: ['created_at', 'updated_at'],
  decisions: ['decided_at', 'recorded_at'],
  work_entries: ['at'],
  torque_entries: ['at'],
  final_checks: ['at'],
};

/**
 * Moves one seeded job and everything recorded on it `days` back in time, so
 * the demo has past visits (the services stamp rows with the clock's now).
 * Seed-only: real records are never rewritten.
 */
export function backdateJob(db: Db, jobId: number, days: number): void {
  if (days <= 0) return;
  const shift = days * DAY_MS;
  for (const [table, cols] of Object.entries(TIME_COLUMNS)) {
    const set = cols.map((c) => `${c} = CASE WHEN ${c} IS NULL THEN NULL ELSE ${c} - ${shift} END`).join(', ');
    const key = table === 'jobs' ? 'id' : 'job_id';
    db.run(sql.raw(`UPDATE ${table} SET ${set} WHERE ${key} = ${Number(jobId)}`));
  }
}

/**
 * Demo history is replayed through the real services, so moving a demo job to ready queued a text to
 * its owner (who prefers texts). That visit is history: its texts and their tasks are dropped before the
 * task runner can take them (the seed is synchronous up to here), so no demo owner is texted at start-up.
 */
export function forgetReplayedTexts(db: Db, shopId: number): void {
  db.run(sql`DELETE FROM tasks WHERE kind = 'text.send' AND shop_id = ${shopId}`);
  db.run(sql`DELETE FROM text_messages WHERE shop_id = ${shopId}`);
}
