import { Router } from 'express';
import type { Sequelize } from 'sequelize';

/** Liveness plus a real round trip to MariaDB, bounded so a dead database answers quickly. */
export function healthRoutes(sequelize: Sequelize): Router {
  const r = Router();
  r.get('/api/health', async (_req, res) => {
    const up = await Promise.race([
      sequelize.query('SELECT 1').then(
        () => true,
        () => false,
      ),
      new Promise<boolean>((resolve) => setTimeout(() => resolve(false), 2000).unref()),
    ]);
    res.status(up ? 200 : 503).json(up ? { status: 'ok', db: 'up' } : { status: 'degraded', db: 'down' });
  });
  return r;
}
