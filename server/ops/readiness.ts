// GET /api/ready: whether this instance should get traffic. Unlike /api/health (liveness: the process
// answers), it checks what a request needs: the database, the schema, room for uploads, a moving outbox.
import type { Sequelize } from 'sequelize';
import { createMigrator } from '../db/migrator.ts';
import { outboxStats } from '../services/outbox-admin.service.ts';
import type { PhotoStore } from '../storage/photo-store.ts';

const CHECK_TIMEOUT_MS = 2000;
const CACHE_MS = 1000;

export interface CheckResult {
  ok: boolean;
  ms: number;
  [detail: string]: unknown;
}
export type CheckName = 'database' | 'migrations' | 'uploads' | 'outbox';
export interface Readiness {
  ok: boolean;
  failed: CheckName[];
  checks: Record<CheckName, CheckResult>;
}

export interface ReadinessDeps {
  sequelize: Sequelize;
  photos: PhotoStore;
  minFreeMb: number;
  maxOutbox: number;
}

/** Run one check with a time bound; a throw or a timeout is a failed check with the reason. */
async function timed(run: () => Promise<Record<string, unknown> & { ok: boolean }>): Promise<CheckResult> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    const result = await Promise.race([
      run(),
      new Promise<never>(
        (_, reject) => (timer = setTimeout(() => reject(new Error(`no answer within ${CHECK_TIMEOUT_MS} ms`)), CHECK_TIMEOUT_MS)),
      ),
    ]);
    return { ...result, ms: Math.round(performance.now() - started) };
  } catch (err) {
    const e = err as NodeJS.ErrnoException;
    return { ok: false, ms: Math.round(performance.now() - started), error: e.code ? `${e.code}: ${e.message}` : String(e.message ?? err) };
  } finally {
    clearTimeout(timer);
  }
}

/** The four checks, run together, cached for a second so a busy probe costs one round of them. */
export function createReadiness(deps: ReadinessDeps): { check(): Promise<Readiness> } {
  // Migrations do not change while the app runs: once current, always current.
  let migrationsCurrent = false;
  let cached: { at: number; result: Promise<Readiness> } | null = null;

  const checks: Record<CheckName, () => Promise<Record<string, unknown> & { ok: boolean }>> = {
    database: async () => {
      await deps.sequelize.query('SELECT 1');
      return { ok: true };
    },
    migrations: async () => {
      if (migrationsCurrent) return { ok: true, pending: [] };
      const pending = (await createMigrator(deps.sequelize).pending()).map((m) => m.name);
      migrationsCurrent = pending.length === 0;
      return { ok: migrationsCurrent, pending };
    },
    uploads: () => deps.photos.check(deps.minFreeMb),
    outbox: async () => {
      const { backlog, oldestAgeS, givenUp } = await outboxStats(deps.sequelize);
      return { ok: backlog < deps.maxOutbox, backlog, maxBacklog: deps.maxOutbox, oldestAgeS: Math.round(oldestAgeS), givenUp };
    },
  };

  async function run(): Promise<Readiness> {
    const names = Object.keys(checks) as CheckName[];
    const results = await Promise.all(names.map((n) => timed(checks[n])));
    const out = Object.fromEntries(names.map((n, i) => [n, results[i]])) as Record<CheckName, CheckResult>;
    const failed = names.filter((n) => !out[n].ok);
    return { ok: failed.length === 0, failed, checks: out };
  }

  return {
    check() {
      const now = Date.now();
      if (!cached || now - cached.at > CACHE_MS) {
        const entry = { at: Infinity, result: run() };
        // Fresh for a second after it answers; a slow round is shared by everyone asking meanwhile.
        void entry.result.finally(() => (entry.at = Date.now()));
        cached = entry;
      }
      return cached.result;
    },
  };
}
