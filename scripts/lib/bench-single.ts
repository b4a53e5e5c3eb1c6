// `npm start`'s shape for the load benchmarks: one private MariaDB (its own data directory on tmpfs when there is one,
// deleted again) migrated and seeded with the demo scenario and its pictures, and one real server process on it, with
// its own OAuth stand-in and SMTP catcher. Rate limits are off. Loopback only.
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import type { Sequelize } from 'sequelize';
// @ts-expect-error plain ESM helper without types
import { serverBuildIsStale } from './paths.mjs';
import { startThrowawayMariaDb, type ThrowawayMariaDb } from './throwaway-mariadb.mjs';
// @ts-expect-error plain ESM helper without types
import { buildServer } from '../build-server.mjs';
import { createSequelize } from '../../server/db/sequelize.ts';
import { createMigrator } from '../../server/db/migrator.ts';
import { initModels } from '../../server/models/index.ts';
import { seedDemoOnce } from '../../server/db/seed/demo.ts';
import { demoPictureAttacher } from '../../server/db/seed/demo-pictures.ts';
import { LocalPhotoStore } from '../../server/storage/local-photo-store.ts';
import { collectServerErrors } from './load-mix.ts';

interface SinglePorts {
  db: number;
  app: number;
  oauth: number;
  smtp: number;
  inbox: number;
}

export interface SingleShape {
  origin: string;
  dbPort: number;
  dir: string;
  /** Bound to the models (initModels), for the benchmark's own rows and counts. */
  sequelize: Sequelize;
  /** The server's log lines at error level or above. */
  serverErrors: string[];
  stop: () => Promise<void>;
}

/**
 * Start MariaDB, migrate, seed, and start the server: `server: 'tsx'` runs server/index.ts through tsx (as
 * development does), `'compiled'` runs dist/server/index.mjs (as `npm start` and the cluster do; built when stale).
 */
export async function startSingleShape(ports: SinglePorts, server: 'tsx' | 'compiled'): Promise<SingleShape> {
  // Durable like production (no `fast`): the benchmarks measure writes.
  const mariadb: ThrowawayMariaDb = await startThrowawayMariaDb({
    port: ports.db,
    database: 'scanwright_load',
    user: 'scanwright_bench',
    password: 'bench-only-password',
    fast: false,
    label: 'bench-single',
  });
  const { dir, db } = mariadb;
  let app: ChildProcess | null = null;
  let sequelize: Sequelize | null = null;
  const stop = async () => {
    await sequelize?.close().catch(() => undefined);
    if (app && app.exitCode === null && app.signalCode === null) {
      const gone = new Promise((r) => app!.once('exit', r));
      app.kill('SIGTERM');
      await gone;
    }
    await mariadb.destroy();
  };
  try {
    sequelize = createSequelize({ ...db, poolMax: 5 });
    await createMigrator(sequelize).up();
    initModels(sequelize);
    const uploads = join(dir, 'uploads');
    await seedDemoOnce(sequelize, demoPictureAttacher(new LocalPhotoStore(uploads)));

    if (server === 'compiled' && serverBuildIsStale()) await buildServer();
    const origin = `http://127.0.0.1:${ports.app}`;
    const { GITHUB_CLIENT_ID: _i, GITHUB_CLIENT_SECRET: _s, SMTP_URL: _m, ADMIN_LOGINS: _a, ...inherited } = process.env;
    const entry = server === 'tsx' ? ['--import', 'tsx', 'server/index.ts'] : ['--enable-source-maps', 'dist/server/index.mjs'];
    app = spawn(process.execPath, entry, {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: {
        ...inherited,
        NODE_ENV: 'production',
        LOG_LEVEL: 'warn',
        HOST: '127.0.0.1',
        PORT: String(ports.app),
        PUBLIC_URL: origin,
        OAUTH_STANDIN_PORT: String(ports.oauth),
        SMTP_CATCHER_PORT: String(ports.smtp),
        INBOX_PORT: String(ports.inbox),
        RATE_LIMITS: 'false',
        DB_HOST: db.host,
        DB_PORT: String(db.port),
        DB_NAME: db.name,
        DB_USER: db.user,
        DB_PASSWORD: db.password,
        SESSION_SECRET: 'bench-load-session-secret-0123456789',
        UPLOADS_DIR: uploads,
        TMPDIR: mariadb.tmp,
      },
    });
    await new Promise<void>((resolve, reject) => {
      let out = '';
      app!.stdout!.on('data', (c: Buffer) => {
        out += c;
        if (out.includes('Scanwright is running')) resolve();
      });
      app!.once('exit', (c) => reject(new Error(`server exited (${c}) before listening:\n${out}`)));
    });
    const serverErrors: string[] = [];
    app.stdout!.on('data', collectServerErrors(serverErrors));
    return { origin, dbPort: ports.db, dir, sequelize, serverErrors, stop };
  } catch (err) {
    await stop();
    throw err;
  }
}
