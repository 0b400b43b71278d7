import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Precompressed copies next to each asset; the API serves them by Accept-Encoding.
  plugins: [
    react(),
    // Installable app: manifest with our own mark, a Workbox service worker that precaches the shell (HTML, JS, CSS,
    // fonts, icons). Nothing from /api is cached by it (owner pages and every image included), and owner pages (/o/…)
    // never get the cached shell: they always come from the server. A new version waits for the user's tap.
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      manifest: {
        name: 'BenchProof',
        short_name: 'BenchProof',
        description: 'Service visits documented at the workstand.',
        start_url: '/jobs',
        scope: '/',
        display: 'standalone',
        orientation: 'portrait',
        background_color: '#FFFFFF',
        theme_color: '#173F3C',
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png' },
          { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
        ],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        globIgnores: ['**/*.{br,gz}', 'customers-import-sample.csv'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//, /^\/o\//],
        runtimeCaching: [],
      },
    }),
    compression({ algorithms: [defineAlgorithm('brotliCompress'), defineAlgorithm('gzip')], threshold: 1024 }),
  ],
  build: {
    outDir: '../../dist/apps/web',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1500,
    // Current browsers preload modules natively; without the polyfill an older one loses only the preload, not the page.
    modulePreload: { polyfill: false },
    // The input, close button and motion/debounce hooks every first screen (sign-in, jobs list, job, owner page) uses,
    // kept in one shared file: left to itself the bundler cuts them into five small ones, which gzip worse
    // (the cold jobs list went from 149.1 to 150.4 KB when the owner page stopped importing Modal and Checkbox).
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            // TanStack Query in one file: every first screen needs it, and left to itself the bundler cuts it in four.
            { name: 'query', test: /@tanstack[\\/](query-core|react-query)[\\/]/ },
            {
              name: 'ui-base',
              test: /@mantine[\\/]core[\\/]esm[\\/]components[\\/](Input|CloseButton)[\\/]|@mantine[\\/]hooks[\\/]esm[\\/](use-reduced-motion|use-media-query|use-did-update|use-debounced-callback|use-uncontrolled)[\\/]/,
            },
          ],
        },
      },
    },
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
