import { SetMetadata } from '@nestjs/common';
import type { AppConfig } from '../../config';
import type { TaskKind } from './task-kinds';
import type { TaskContext } from './tasks.port';

export const TASK_HANDLER = Symbol('TASK_HANDLER');

export interface TaskHandlerOptions {
  /** How many tasks of this kind may run at once (image work must not starve the API); may come from the config. */
  concurrency: number | ((cfg: AppConfig) => number);
  /** Attempts before the task ends failed; the runner's default (5) when left out. */
  maxAttempts?: number;
}

export interface TaskHandlerMeta extends TaskHandlerOptions {
  kind: TaskKind;
}

/**
 * Marks a provider's method as THE handler of a task kind. TaskHandlerRegistry finds it at
 * start-up (Nest's DiscoveryService) and registers it with the runner; a declared kind with no
 * handler, or with two, stops start-up. The method receives the typed `TaskContext<kind>`.
 */
export function TaskHandler<K extends TaskKind>(kind: K, options: TaskHandlerOptions) {
  return (target: object, method: string | symbol, descriptor: { value?: (task: TaskContext<K>) => Promise<void> }): void => {
    SetMetadata<symbol, TaskHandlerMeta>(TASK_HANDLER, { kind, ...options })(target, method, descriptor as PropertyDescriptor);
  };
}
