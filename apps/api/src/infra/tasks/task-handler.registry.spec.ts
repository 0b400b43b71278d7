import { Injectable } from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { Test } from '@nestjs/testing';
import { APP_CONFIG } from '../../config';
import { TaskHandler } from './task-handler.decorator';
import { TaskHandlerRegistry } from './task-handler.registry';
import { TASK_KINDS, type TaskKind } from './task-kinds';
import { TASK_RUNNER, type TaskContext } from './tasks.port';

const noop = (): Promise<void> => Promise.resolve();

/** Handles every declared kind but report.render. */
@Injectable()
class MostKinds {
  seen: string[] = [];
  @TaskHandler('mail.send', { concurrency: 2, maxAttempts: 1 }) mail(): Promise<void> {
    return noop();
  }
  @TaskHandler('media.derivatives', { concurrency: (cfg) => (cfg as { DERIVATIVES_CONCURRENCY: number }).DERIVATIVES_CONCURRENCY, maxAttempts: 3 })
  derivatives(t: TaskContext<'media.derivatives'>): Promise<void> {
    this.seen.push(t.key);
    return Promise.resolve();
  }
  @TaskHandler('backup.run', { concurrency: 1 }) backup(): Promise<void> {
    return noop();
  }
  @TaskHandler('media.phash', { concurrency: 1 }) phash(): Promise<void> {
    return noop();
  }
  @TaskHandler('annotation.render', { concurrency: 1 }) annotation(): Promise<void> {
    return noop();
  }
  @TaskHandler('showcase.export', { concurrency: 1 }) showcase(): Promise<void> {
    return noop();
  }
  @TaskHandler('text.send', { concurrency: 1 }) text(): Promise<void> {
    return noop();
  }
}

@Injectable()
class ReportKind {
  @TaskHandler('report.render', { concurrency: 1, maxAttempts: 3 }) render(): Promise<void> {
    return noop();
  }
}

@Injectable()
class AnotherReportKind {
  @TaskHandler('report.render', { concurrency: 1 }) alsoRender(): Promise<void> {
    return noop();
  }
}

async function boot(handlers: (new (...args: never[]) => object)[]) {
  const registered = new Map<string, { handler: (t: never) => Promise<void>; options: unknown }>();
  const runner = { register: (kind: string, handler: (t: never) => Promise<void>, options: unknown) => registered.set(kind, { handler, options }) };
  const mod = await Test.createTestingModule({
    imports: [DiscoveryModule],
    providers: [
      TaskHandlerRegistry,
      ...handlers,
      { provide: TASK_RUNNER, useValue: runner },
      { provide: APP_CONFIG, useValue: { DERIVATIVES_CONCURRENCY: 4 } },
    ],
  }).compile();
  return { init: () => mod.init(), mod, registered };
}

describe('TaskHandlerRegistry (@TaskHandler discovered at start-up)', () => {
  it('stops start-up when a declared task kind has no handler, naming the kind', async () => {
    const { init, registered } = await boot([MostKinds]);
    await expect(init()).rejects.toThrow(
      "Background tasks are not wired: task kind 'report.render' is declared in task-kinds.ts but no @TaskHandler handles it.",
    );
    expect(registered.size).toBe(0);
  });

  it('stops start-up when a kind is handled twice, naming both handlers', async () => {
    const { init } = await boot([MostKinds, ReportKind, AnotherReportKind]);
    await expect(init()).rejects.toThrow('ReportKind.render, AnotherReportKind.alsoRender');
  });

  it('registers every declared kind once, with its options, and calls the method on its instance', async () => {
    const { init, mod, registered } = await boot([MostKinds, ReportKind]);
    await init();
    expect([...registered.keys()].sort()).toEqual([...TASK_KINDS].sort());
    expect(registered.get('media.derivatives' satisfies TaskKind)?.options).toEqual({ concurrency: 4, maxAttempts: 3 });
    expect(registered.get('mail.send')?.options).toEqual({ concurrency: 2, maxAttempts: 1 });
    await registered.get('media.derivatives')?.handler({ key: '42' } as never);
    expect(mod.get(MostKinds).seen).toEqual(['42']);
  });
});
