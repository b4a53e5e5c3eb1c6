import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const fromRoot = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const alias = { '@/': fromRoot('./src/'), '@shared/': fromRoot('./shared/') };

export default defineConfig({
  resolve: { alias },
  test: {
    env: { TZ: 'UTC' },
    // Projects of one `sequence.groupOrder` run together and must agree on maxWorkers. Every project runs two
    // files at a time (vitest's default is cores − 1, one worker on a two-core machine): unit and api first,
    // then browser, then faults (`npm test` runs the phases as separate vitest processes, scripts/test.mjs).
    // Each api and browser worker has its own database copy (tests/support/worker-database.ts).
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
        // Database and process faults (killed servers, a MariaDB that goes away): slow and mostly waiting. Each file
        // owns its processes (a private MariaDB, its own ports and data folder), so two run side by side.
        test: {
          name: 'faults',
          include: ['tests/faults/**/*.test.ts'],
          environment: 'node',
          testTimeout: 60000,
          hookTimeout: 60000,
          sequence: { groupOrder: 2 },
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          // Each worker has its own database copy with the demo seeded once, and its own uploads folder.
          env: { TEST_WORKER_DATABASE_GROUP: 'browser' },
          setupFiles: ['tests/support/worker-database.ts', 'tests/support/browser-failures.ts'],
          // Each file starts its own live app (tests/support/browser.ts); one module cache per worker. Two files run
          // side by side: a journey mostly waits on chromium and the app.
          isolate: false,
          testTimeout: 60000,
          hookTimeout: 60000,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
