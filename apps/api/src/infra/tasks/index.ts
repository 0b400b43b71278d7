export { TASK_RUNNER, type DbTx, type TaskContext, type TaskHandler, type TaskKindOptions, type TaskRunner, type TaskSpec, type TaskState, type TaskStatus } from './tasks.port';
export { TasksModule } from './tasks.module';
