// The real server in its own process (as in production), for the load benchmarks: the load
// generator does not share its event loop. Stand-ins stay off; rate limits are switched off.
import { spawn } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import { benchConfig } from './bench-db.ts';
import { freePort } from './scratch.mjs';

/**
 * Starts the server on one bench database and waits for its health route; `stop()` ends it. With `signIn`, the local
 * OAuth stand-in runs beside it (on free ports), so a browser can sign in as a seeded account via `/auth/github?login=`.
 */
export async function startServerProcess(
  database: string,
  { signIn = false }: { signIn?: boolean } = {},
): Promise<{ base: string; stop: () => Promise<unknown> }> {
  const config = benchConfig(database);
  const port = await freePort();
  const github = signIn
    ? {
        OAUTH_STANDIN_PORT: String(await freePort()),
        SMTP_CATCHER_PORT: String(await freePort()),
        INBOX_PORT: String(await freePort()),
        PUBLIC_URL: `http://127.0.0.1:${port}`,
      }
    : { GITHUB_CLIENT_ID: 'bench', GITHUB_CLIENT_SECRET: 'bench' };
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    stdio: ['ignore', 'ignore', 'inherit'],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      LOG_LEVEL: 'silent',
      RATE_LIMITS: 'false',
      PORT: String(port),
      HOST: '127.0.0.1',
      DB_HOST: config.db.host,
      DB_PORT: String(config.db.port),
      DB_NAME: config.db.name,
      DB_USER: config.db.user,
      DB_PASSWORD: config.db.password,
      DB_POOL_MAX: '20',
      ...github,
      SMTP_URL: 'smtp://127.0.0.1:9',
      SESSION_SECRET: 'bench-session-secret-bench-session-secret',
    },
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 200; i++) {
    const up = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) {
      return {
        base,
        stop: () =>
          new Promise((r) => {
            child.once('exit', r);
            child.kill('SIGTERM');
          }),
      };
    }
    await sleep(100);
  }
  child.kill('SIGKILL');
  throw new Error('server did not start');
}
