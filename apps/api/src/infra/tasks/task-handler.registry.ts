import { Inject, Injectable, type OnModuleInit } from '@nestjs/common';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import { APP_CONFIG, type AppConfig } from '../../config';
import { TASK_HANDLER, type TaskHandlerMeta } from './task-handler.decorator';
import { TASK_KINDS, type TaskKind } from './task-kinds';
import { TASK_RUNNER, type TaskHandlerFn, type TaskRunner } from './tasks.port';

interface Found {
  meta: TaskHandlerMeta;
  where: string;
  handler: TaskHandlerFn;
}

/**
 * Finds every `@TaskHandler` method once all providers exist and registers it with the runner,
 * before the runner starts (TasksModule's bootstrap). Start-up fails when a kind of TASK_KINDS
 * has no handler or two, or a handler names a kind that is not declared.
 */
@Injectable()
export class TaskHandlerRegistry implements OnModuleInit {
  constructor(
    private readonly discovery: DiscoveryService,
    private readonly scanner: MetadataScanner,
    private readonly reflector: Reflector,
    @Inject(TASK_RUNNER) private readonly runner: TaskRunner,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  onModuleInit(): void {
    const found = this.discover();
    checkHandlers(found, TASK_KINDS);
    for (const { meta, handler } of found) {
      const concurrency = typeof meta.concurrency === 'function' ? meta.concurrency(this.cfg) : meta.concurrency;
      this.runner.register(meta.kind, handler, { concurrency, maxAttempts: meta.maxAttempts });
    }
  }

  private discover(): Found[] {
    const found: Found[] = [];
    for (const wrapper of this.discovery.getProviders()) {
      const instance: unknown = wrapper.instance;
      if (!instance || typeof instance !== 'object' || !wrapper.isDependencyTreeStatic()) continue;
      const proto = Object.getPrototypeOf(instance) as Record<string, unknown>;
      for (const name of this.scanner.getAllMethodNames(proto)) {
        const meta = this.reflector.get<TaskHandlerMeta | undefined>(TASK_HANDLER, proto[name] as () => unknown);
        if (!meta) continue;
        const method = proto[name] as TaskHandlerFn;
        // The driver hands back the payload enqueue typed for this kind.
        found.push({ meta, where: `${instance.constructor.name}.${name}`, handler: (task) => method.call(instance, task) });
      }
    }
    return found;
  }
}

/** Every declared kind handled exactly once, and nothing handled that is not declared. */
export function checkHandlers(found: readonly Pick<Found, 'meta' | 'where'>[], declared: readonly TaskKind[]): void {
  const problems: string[] = [];
  for (const kind of declared) {
    const by = found.filter((f) => f.meta.kind === kind).map((f) => f.where);
    if (by.length === 0) problems.push(`task kind '${kind}' is declared in task-kinds.ts but no @TaskHandler handles it`);
    if (by.length > 1) problems.push(`task kind '${kind}' has ${by.length} handlers (${by.join(', ')}); keep one`);
  }
  for (const f of found) {
    if (!declared.includes(f.meta.kind)) problems.push(`${f.where} handles '${f.meta.kind}', which task-kinds.ts does not declare`);
  }
  if (problems.length > 0) throw new Error(`Background tasks are not wired: ${problems.join('; ')}.`);
}
