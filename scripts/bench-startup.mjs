// `npm run bench:startup`: how long the server takes from spawn to its first healthy answer, and its
// resident memory once up, for the compiled bundle (what `npm start` runs) against tsx (development),
// each started 3 times against a throwaway MariaDB.
import { spawn, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';
import { buildServer } from './build-server.mjs';
import { freePort } from './lib/scratch.mjs';
import { startThrowawayMariaDb } from './lib/throwaway-mariadb.mjs';

const creds = { database: 'scanwright_startup', user: 'scanwright', password: 'startup-only-password' };
const mariadb = await startThrowawayMariaDb({ ...creds, label: 'startup' });
const env = {
  ...process.env,
  NODE_ENV: 'production',
  LOG_LEVEL: 'silent',
  SESSION_SECRET: 'startup-bench-session-secret-0123456789',
  DB_HOST: '127.0.0.1',
  DB_PORT: String(mariadb.port),
  DB_NAME: creds.database,
  DB_USER: creds.user,
  DB_PASSWORD: creds.password,
};
await buildServer();
spawnSync(process.execPath, ['dist/server/migrate.mjs'], { env, stdio: 'ignore' });

const modes = {
  'compiled (node dist/server/index.mjs)': ['dist/server/index.mjs'],
  'tsx (node --import tsx server/index.ts)': ['--import', 'tsx', 'server/index.ts'],
};
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
try {
  for (const [name, args] of Object.entries(modes)) {
    const times = [];
    const rss = [];
    for (let i = 0; i < 3; i++) {
      const port = await freePort();
      const started = performance.now();
      const child = spawn(process.execPath, args, {
        env: {
          ...env,
          PORT: String(port),
          OAUTH_STANDIN_PORT: String(await freePort()),
          SMTP_CATCHER_PORT: String(await freePort()),
          INBOX_PORT: String(await freePort()),
        },
        stdio: ['ignore', 'ignore', 'inherit'],
      });
      let exitCode = null;
      child.once('exit', (code) => (exitCode = code ?? 1));
      for (;;) {
        const ok = await fetch(`http://127.0.0.1:${port}/api/health`).then(
          (r) => r.ok,
          () => false,
        );
        if (ok) break;
        if (exitCode !== null) throw new Error(`${name} exited with ${exitCode} before answering`);
        if (performance.now() - started > 60_000) throw new Error(`${name} did not answer within 60 s`);
        await sleep(10);
      }
      times.push(performance.now() - started);
      await sleep(500);
      const status = readFileSync(`/proc/${child.pid}/status`, 'utf8');
      rss.push(Number(/VmRSS:\s+(\d+)/.exec(status)[1]) / 1024);
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    }
    console.log(
      `${name.padEnd(42)} start-up median ${median(times).toFixed(0)} ms (${times.map((t) => t.toFixed(0)).join(', ')}), RSS median ${median(rss).toFixed(0)} MB`,
    );
  }
} finally {
  await mariadb.destroy();
}
