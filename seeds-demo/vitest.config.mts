import { defaultServerConditions } from 'vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Workspace packages export their TypeScript under the `source` condition; the tests run
  // on Node (Vite's server side), so they read packages/contracts/src with no prior build.
  ssr: { resolve: { conditions: ['source', ...defaultServerConditions] } },
  test: { include: ['src/**/*.test.ts'] },
});
