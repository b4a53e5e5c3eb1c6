import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const fromRoot = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const alias = { '@/': fromRoot('./src/'), '@shared/': fromRoot('./shared/') };

export default defineConfig({
  resolve: { alias },
  test: {
    env: { TZ: 'UTC' },
    // Projects of one `sequence.groupOrder` run together and must agree on maxWorkers. unit and api run
    // first, two files at a time (vitest's default is cores − 1, one worker on a two-core machine); then
    // browser, then faults, one file at a time (`npm test` runs the phases as separate vitest processes,
    // scripts/test.mjs). Each api worker has its own database copy
    // (tests/support/worker-database.ts).
    maxWorkers: 2,
    projects: [
      {
        resolve: { alias },
        // Pure code: files share one module cache per worker (no per-file re-import).
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
          isolate: false,
          sequence: { groupOrder: 0 },
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          // Each file builds its own app and rows (tests/support/test-app.ts), so files can share one module
          // cache per worker instead of importing the whole server again for every file.
          isolate: false,
          setupFiles: ['tests/support/worker-database.ts'],
          testTimeout: 20000,
          hookTimeout: 30000,
          sequence: { groupOrder: 0 },
        },
      },
      {
        resolve: { alias },
        // Database and process faults (killed servers, a MariaDB that goes away): slow, and each file
        // owns its processes, so they run one file at a time in their own project.
        test: {
          name: 'faults',
          include: ['tests/faults/**/*.test.ts'],
          environment: 'node',
          testTimeout: 60000,
          hookTimeout: 60000,
          maxWorkers: 1,
          sequence: { groupOrder: 2 },
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/support/browser-failures.ts'],
          // Each file starts its own live app (tests/support/browser.ts); one module cache per worker.
          isolate: false,
          testTimeout: 60000,
          hookTimeout: 60000,
          maxWorkers: 1,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
