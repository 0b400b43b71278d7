export {
  TASK_RUNNER,
  type FailedTask,
  type RawTaskContext,
  type RawTaskSpec,
  type TaskContext,
  type TaskHandlerFn,
  type TaskKindOptions,
  type TaskRunner,
  type TaskRunnerHealth,
  type TaskSpec,
  type TaskState,
  type TaskStatus,
} from './tasks.port';
export { TASK_KINDS, type NoPayload, type TaskKind, type TaskPayloads } from './task-kinds';
export { TaskHandler, type TaskHandlerOptions } from './task-handler.decorator';
export { TaskHandlerRegistry } from './task-handler.registry';
export { TasksModule } from './tasks.module';
export { SqliteTaskRunner, type SqliteRunnerOptions } from './sqlite-task-runner';
export { BullMqTaskRunner, type BullMqRunnerOptions } from './bullmq/bullmq-task-runner';
export { TaskStore } from './task-store';
export { retryDelay, type BackoffOptions } from './backoff';
export { isTransientError, PermanentTaskError } from './task-errors';
