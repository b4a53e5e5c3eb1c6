// Maintenance fence for `npm run db:restore`: while a row `maintenance` exists in `app_meta`, requests that
// change data answer 503 `maintenance` with Retry-After; reads go on. The flag is read from the database
// (so every instance sees it) at most once a second, and only when a write asks.
import type { RequestHandler } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { routePath } from './route-path.ts';

const FRESH_MS = 1000;
const READS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Writes under /api and sign-in/out; the pure workbench calculations store nothing and stay open. */
const changesData = (method: string, path: string) =>
  path.startsWith('/auth/') || (path.startsWith('/api/') && !READS.has(method) && !path.startsWith('/api/workbench/'));

export function maintenance(sequelize: Sequelize): RequestHandler {
  let on = false;
  let checkedAt = 0;
  let pending: Promise<void> | null = null;
  const read = () =>
    sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM app_meta WHERE meta_key = 'maintenance'", { type: QueryTypes.SELECT });
  const refresh = () =>
    (pending ??= Promise.race([
      read().then((rows) => {
        on = Number(rows[0]?.n) > 0;
      }),
      new Promise<void>((resolve) => setTimeout(resolve, 1000).unref()),
    ])
      // The database being down is the routes' 503 to give; keep what we knew.
      .catch(() => undefined)
      .finally(() => {
        checkedAt = Date.now();
        pending = null;
      }));
  return async (req, res, next) => {
    if (!changesData(req.method, routePath(req))) return next();
    if (Date.now() - checkedAt > FRESH_MS) await refresh();
    if (!on) return next();
    res
      .status(503)
      .set('Retry-After', '15')
      .json({
        error: {
          code: 'maintenance',
          message: 'Scanwright is being restored from a backup: changes are paused for a minute. Please try again shortly.',
        },
      });
  };
}
