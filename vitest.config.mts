import { defineConfig } from 'vitest/config';

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
