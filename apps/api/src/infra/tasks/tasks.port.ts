import type { DbTx } from '../../core/db';
import type { NoPayload, TaskKind, TaskPayload, TaskPayloads } from './task-kinds';

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
  payload?: TaskPayload;
  runAt?: Date;
}

/** The untyped context the drivers build; `TaskContext<K>` is what a handler declares. */
export interface RawTaskContext {
  kind: string;
  key: string;
  shopId: number | null;
  payload: TaskPayload;
  attempt: number;
  /** True when a failure of this attempt ends the quick retries (the task then fails, or waits long if the error is transient). */
  final: boolean;
  progress(fraction: number): void;
}

/** What a handler receives. Handlers must be idempotent: a task may run again after a crash. */
export interface TaskContext<K extends TaskKind = TaskKind> {
  kind: K;
  key: string;
  shopId: number | null;
  payload: TaskPayloads[K];
  attempt: number;
  /** True when a failure of this attempt ends the quick retries (see RawTaskContext). */
  final: boolean;
  /** Reports progress 0..1 for screens that show it. */
  progress(fraction: number): void;
}

/** A registered handler as drivers see it (the `@TaskHandler` method, bound; the payload was typed at enqueue). */
export type TaskHandlerFn = (task: RawTaskContext) => Promise<void>;

export interface TaskKindOptions {
  /** How many tasks of this kind may run at once (image work must not starve the API). */
  concurrency: number;
  maxAttempts?: number;
  /** First retry delay of this kind (the one backoff function, retryDelay); the runner's default when left out. */
  backoffBaseMs?: number;
}

export type TaskState = 'queued' | 'running' | 'done' | 'failed';

export interface TaskStatus {
  kind: string;
  key: string;
  state: TaskState;
  attempts: number;
  lastError: string | null;
  progress: number;
  /** When it runs next: a queued task's next try, or a failed task's long retry (transient errors). */
  nextRunAt: string | null;
}

/** A failed task as the manager's screen lists it. */
export interface FailedTask extends TaskStatus {
  id: number;
  shopId: number | null;
  updatedAt: string;
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
  /** Failed tasks of one shop, newest first (the manager's retry screen). */
  failed?(shopId: number): FailedTask[];
  /** Queues a failed task of that shop again at once with fresh attempts; false when there is no such failed task. */
  retry?(shopId: number, id: number): boolean;
  /** Resolves when nothing is queued or running (tests and shutdown); tasks scheduled for later are not waited for. */
  settled(): Promise<void>;
  /** For the readiness check: is the runner polling, and how much work waits. */
  health?(): TaskRunnerHealth;
  /** Deletes finished (done) tasks last touched before `before`; returns how many. */
  prune?(before: Date): number;
  /**
   * Shutdown (SIGTERM): takes no new work, waits up to `graceMs` for running tasks, then releases the leases of those
   * still running so the next process takes them at once. Idempotent: a second call waits on the first.
   */
  stop?(graceMs?: number): Promise<void>;
}

export interface TaskRunnerHealth {
  ok: boolean;
  driver: string;
  /** Last time the runner looked for work (ISO), null before it started. */
  lastPollAt: string | null;
  counts: Record<TaskState, number>;
}

export const TASK_RUNNER = Symbol('TASK_RUNNER');
