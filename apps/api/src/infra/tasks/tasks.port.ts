import type { DbTx } from '../../core/db';
import type { NoPayload, TaskKind, TaskPayloads } from './task-kinds';

/** What a piece of slow work is: its kind, the entity it is about, and the ids the handler needs. */
export type TaskSpec<K extends TaskKind = TaskKind> = {
  kind: K;
  /** The entity the task works on; (kind, key) makes the task idempotent. */
  key: string;
  shopId: number | null;
  /** Not before this time (periodic housekeeping); default now. */
  runAt?: Date;
} & (TaskPayloads[K] extends NoPayload ? { payload?: NoPayload } : { payload: TaskPayloads[K] });

/** The untyped form the drivers store (kinds are strings in the table). */
export interface RawTaskSpec {
  kind: string;
  key: string;
  shopId: number | null;
  payload?: object;
  runAt?: Date;
}

/** The untyped context the drivers build; `TaskContext<K>` is what a handler declares. */
export interface RawTaskContext {
  kind: string;
  key: string;
  shopId: number | null;
  payload: object;
  attempt: number;
  progress(fraction: number): void;
}

/** What a handler receives. Handlers must be idempotent: a task may run again after a crash. */
export interface TaskContext<K extends TaskKind = TaskKind> {
  kind: K;
  key: string;
  shopId: number | null;
  payload: TaskPayloads[K];
  attempt: number;
  /** Reports progress 0..1 for screens that show it. */
  progress(fraction: number): void;
}

/** A registered handler as drivers see it (the `@TaskHandler` method, bound; the payload was typed at enqueue). */
export type TaskHandlerFn = (task: RawTaskContext) => Promise<void>;

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
 * added again; a failed one is queued afresh. Implementations: SQLite (default); a BullMQ
 * driver implements the same port (register → a Worker per kind, enqueue → an outbox row in
 * `tx` relayed to the queue after commit).
 */
export interface TaskRunner {
  /** Called once per kind at start-up by TaskHandlerRegistry (from `@TaskHandler` methods); features never call it. */
  register(kind: TaskKind, handler: TaskHandlerFn, options: TaskKindOptions): void;
  /** Pass the unit of work's `tx` so the task commits (or vanishes) with the change. */
  enqueue<K extends TaskKind>(spec: TaskSpec<K>, tx?: DbTx): void;
  status(kind: TaskKind, key: string): TaskStatus | null;
  /** Done tasks of one kind for one shop, with their payloads (e.g. to find finished exports that hold a job's photos). */
  finished<K extends TaskKind>(kind: K, shopId: number): { key: string; payload: TaskPayloads[K] }[];
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
