import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Precompressed copies next to each asset; the API serves them by Accept-Encoding.
  plugins: [react(), compression({ algorithms: [defineAlgorithm('brotliCompress'), defineAlgorithm('gzip')], threshold: 1024 })],
  build: {
    outDir: '../../dist/apps/web',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1500,
    // Current browsers preload modules natively; without the polyfill an older one loses only the preload, not the page.
    modulePreload: { polyfill: false },
  },
  server: { proxy: { '/api': 'http://localhost:3000' } },
  test: {
    name: 'web',
    environment: 'jsdom',
    globals: true,
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/test-setup.ts'],
  },
});
