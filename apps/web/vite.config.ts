import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: [
      { find: '@', replacement: new URL('./src', import.meta.url).pathname },
      // Zod without its eval probe, set before any schema is defined (src/lib/zod-jitless.ts).
      { find: /^zod$/, replacement: new URL('./src/lib/zod-jitless.ts', import.meta.url).pathname },
    ],
    // Workspace packages export their TypeScript under the `source` condition, so dev,
    // build and tests read packages/contracts/src with no prior build.
    conditions: ['source', ...defaultClientConditions],
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: { '/api': { target: 'http://127.0.0.1:3000' } },
  },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  build: { outDir: 'dist', emptyOutDir: true },
  test: {
    environment: 'jsdom',
    setupFiles: ['./test/setup.ts'],
    css: false,
    include: ['src/**/*.test.{ts,tsx}', 'test/**/*.test.{ts,tsx}'],
    unstubGlobals: true,
    restoreMocks: true,
    // Above the DOM queries' 10 s wait, so a slow first render fails on its own words.
    testTimeout: 30_000,
  },
});
