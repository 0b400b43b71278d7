import { existsSync } from 'node:fs';
import { defineConfig } from 'vitest/config';

/** The task suite (and tus uploads) again with TASKS=redis (BullMQ) and REDIS_URL, only where Debian's redis-server is installed; test/redis/ prints why it skips otherwise. */
const REDIS_TASK_SUITE = existsSync(process.env.REDIS_SERVER_BIN ?? '/usr/bin/redis-server')
  ? [
      'test/e2e/background-work.e2e-spec.ts',
      'test/e2e/mail.e2e-spec.ts',
      'test/e2e/annotations.e2e-spec.ts',
      'test/e2e/domain-events.e2e-spec.ts',
      'test/e2e/pairs.e2e-spec.ts',
      'test/e2e/showcase-export.e2e-spec.ts',
      'test/e2e/reports.e2e-spec.ts',
      'test/e2e/media-tus.e2e-spec.ts', // tus with its upload locks in Redis (RedisTusLocker), a cut-off PATCH resumed
    ]
  : [];

const lib = (name: string) => ({
  test: { name, root: `libs/${name}`, include: ['src/**/*.test.ts'], globals: true },
});

export default defineConfig({
  test: {
    projects: [
      lib('domain'),
      lib('contracts'),
      lib('annotation'),
      {
        test: { name: 'seeds', root: 'seeds', include: ['src/**/*.test.ts'], globals: true },
      },
      'apps/web/vite.config.ts',
      {
        test: {
          name: 'api-unit',
          root: 'apps/api',
          environment: 'node',
          globals: true,
          include: ['src/**/*.spec.ts', 'test/lint/**/*.spec.ts'],
          setupFiles: ['reflect-metadata'],
        },
      },
      {
        test: {
          name: 'api-e2e',
          root: 'apps/api',
          environment: 'node',
          globals: true,
          include: ['test/e2e/**/*.e2e-spec.ts'],
          setupFiles: ['reflect-metadata'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        // The media flows that touch storage, again with media in an S3 bucket (s3rver on loopback, one per test app).
        test: {
          name: 'api-s3',
          root: 'apps/api',
          environment: 'node',
          globals: true,
          include: [
            'test/e2e/media-intake.e2e-spec.ts',
            'test/e2e/media-images.e2e-spec.ts',
            'test/e2e/media-tus.e2e-spec.ts',
            'test/e2e/media-access.e2e-spec.ts',
            'test/e2e/backup-restore.e2e-spec.ts',
            'test/s3/**/*.e2e-spec.ts',
          ],
          env: { TEST_STORAGE: 's3' },
          setupFiles: ['reflect-metadata'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        // Several API processes: tasks on BullMQ, live updates and rate limits on Redis (one redis-server per run, see the global setup).
        test: {
          name: 'api-redis',
          root: 'apps/api',
          environment: 'node',
          globals: true,
          include: ['test/redis/**/*.e2e-spec.ts', ...REDIS_TASK_SUITE],
          env: { TEST_TASKS: 'redis' },
          globalSetup: ['./test/support/redis-global-setup.ts'],
          setupFiles: ['reflect-metadata'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        test: {
          name: 'browser',
          root: 'apps/web/e2e',
          environment: 'node',
          globals: true,
          include: ['**/*.e2e.ts'],
          globalSetup: ['./support/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
