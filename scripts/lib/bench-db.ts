// A private MariaDB for benchmarks in .data/mariadb-bench (kept between runs so large seeds are reused).
import { join } from 'node:path';
import type { ChildProcess } from 'node:child_process';
// @ts-expect-error plain ESM helper without types
import { initDataDir, startServer, ensureDatabase, stopServer } from './mariadb.mjs';
import { loadConfig, type Config } from '../../server/config.ts';

export const BENCH_PORT = Number(process.env.BENCH_MARIADB_PORT ?? 3317);
const DIR = join(process.cwd(), '.data', 'mariadb-bench');
const CREDS = { user: 'scanwright_bench', password: 'bench-only-password' };

/** Start (or reuse) the bench server; returns a stop function. */
export async function startBenchDb(): Promise<() => Promise<void>> {
  initDataDir(DIR);
  const child: ChildProcess = await startServer(DIR, BENCH_PORT, { fast: true });
  return () => stopServer(child);
}

/** Config of the app against one bench database (created when missing). */
export function benchConfig(database: string): Config {
  ensureDatabase(DIR, { database, ...CREDS });
  return loadConfig({
    ...process.env,
    NODE_ENV: 'production',
    SESSION_SECRET: process.env.SESSION_SECRET ?? 'bench-only-session-secret-0123456789',
    LOG_LEVEL: 'silent',
    RATE_LIMITS: 'false',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(BENCH_PORT),
    DB_NAME: database,
    DB_USER: CREDS.user,
    DB_PASSWORD: CREDS.password,
    DB_POOL_MAX: '20',
  });
}

export const scaleDbName = (parts: number) => `scanwright_scale_${parts}`;
