import { Global, Module } from '@nestjs/common';
import { MemoryTaskRunner } from './memory-task-runner';
import { TASK_RUNNER } from './tasks.port';

@Global()
@Module({ providers: [{ provide: TASK_RUNNER, useFactory: () => new MemoryTaskRunner() }], exports: [TASK_RUNNER] })
export class TasksModule {}
