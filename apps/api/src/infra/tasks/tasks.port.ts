import type { Db } from '../../core/db';

/** A Drizzle transaction (better-sqlite3: synchronous). Enqueue inside it to commit the task with the change. */
export type DbTx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** What a piece of slow work is: its kind, the entity it is about, and data the handler needs. */
export interface TaskSpec {
  /** e.g. 'media.derivatives', 'report.render', 'mail.send', 'showcase.export' */
  kind: string;
  /** The entity the task works on; (kind, key) makes the task idempotent. */
  key: string;
  shopId: number | null;
  payload?: Record<string, unknown>;
  /** Not before this time (periodic housekeeping); default now. */
  runAt?: Date;
}

/** What a handler receives. Handlers must be idempotent: a task may run again after a crash. */
export interface TaskContext extends Required<Omit<TaskSpec, 'payload' | 'runAt'>> {
  payload: Record<string, unknown>;
  attempt: number;
  /** Reports progress 0..1 for screens that show it. */
  progress(fraction: number): void;
}

export type TaskHandler = (task: TaskContext) => Promise<void>;

export interface TaskKindOptions {
  /** How many tasks of this kind may run at once (image work must not starve the API). */
  concurrency: number;
  maxAttempts?: number;
}

export type TaskState = 'queued' | 'running' | 'done' | 'failed';

export interface TaskStatus {
  kind: string;
  key: string;
  state: TaskState;
  attempts: number;
  lastError: string | null;
  progress: number;
  nextRunAt: string | null;
}

/**
 * One runner for every slow job. A (kind, key) that is queued, running or done is not
 * added again; a failed one is queued afresh. Implementations: SQLite (default).
 */
export interface TaskRunner {
  register(kind: string, handler: TaskHandler, options: TaskKindOptions): void;
  enqueue(spec: TaskSpec, tx?: DbTx): void;
  status(kind: string, key: string): TaskStatus | null;
  /** Done tasks of one kind for one shop, with their payloads (e.g. to find finished exports that hold a job's photos). */
  finished(kind: string, shopId: number): { key: string; payload: Record<string, unknown> }[];
  /** Resolves when nothing is queued or running (tests and shutdown); tasks scheduled for later are not waited for. */
  settled(): Promise<void>;
  /** For the readiness check: is the runner polling, and how much work waits. */
  health?(): TaskRunnerHealth;
  /** Deletes finished (done) tasks last touched before `before`; returns how many. */
  prune?(before: Date): number;
}

export interface TaskRunnerHealth {
  ok: boolean;
  driver: string;
  /** Last time the runner looked for work (ISO), null before it started. */
  lastPollAt: string | null;
  counts: Record<TaskState, number>;
}

export const TASK_RUNNER = Symbol('TASK_RUNNER');
