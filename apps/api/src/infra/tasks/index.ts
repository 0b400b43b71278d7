export {
  TASK_RUNNER,
  type DbTx,
  type TaskContext,
  type TaskHandler,
  type TaskKindOptions,
  type TaskRunner,
  type TaskRunnerHealth,
  type TaskSpec,
  type TaskState,
  type TaskStatus,
} from './tasks.port';
export { TasksModule } from './tasks.module';
export { SqliteTaskRunner, type SqliteRunnerOptions } from './sqlite-task-runner';
export { TaskStore } from './task-store';
export { retryDelay, type BackoffOptions } from './backoff';
