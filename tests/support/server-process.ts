// The real server process (`node --import tsx server/index.ts`) on free loopback ports (app, OAuth stand-in,
// SMTP catcher, inbox) against a private MariaDB, for the fault tests that kill, signal or double it.
import { spawn, type ChildProcess } from 'node:child_process';
import { freePort } from '../../scripts/lib/scratch.mjs';
import type { PrivateMariaDb } from './private-mariadb.ts';

export interface RunningServer {
  port: number;
  base: string;
  child: ChildProcess;
  output: () => string;
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  waitForOutput(pattern: RegExp, timeoutMs?: number): Promise<void>;
  stop(): Promise<void>;
}

/** Real GitHub, a real mail relay, admin handles and a metrics token stay out: the stand-ins are part of the tests. */
const KEPT_OUT = ['GITHUB_CLIENT_ID', 'GITHUB_CLIENT_SECRET', 'SMTP_URL', 'ADMIN_LOGINS', 'METRICS_TOKEN'];

/** Spawns the server and waits until it says it is running; `env` adds or overrides variables. */
export async function startServerProcess(opts: {
  db: PrivateMariaDb;
  uploads: string;
  sessionSecret: string;
  env?: Record<string, string>;
  startTimeoutMs?: number;
}): Promise<RunningServer> {
  const [port, oauth, smtp, inbox] = [await freePort(), await freePort(), await freePort(), await freePort()];
  const inherited = Object.fromEntries(Object.entries(process.env).filter(([k]) => !KEPT_OUT.includes(k)));
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: process.cwd(),
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...inherited,
      NODE_ENV: 'production',
      LOG_LEVEL: 'info',
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      OAUTH_STANDIN_PORT: String(oauth),
      SMTP_CATCHER_PORT: String(smtp),
      INBOX_PORT: String(inbox),
      DB_HOST: opts.db.db.host,
      DB_PORT: String(opts.db.db.port),
      DB_NAME: opts.db.db.name,
      DB_USER: opts.db.db.user,
      DB_PASSWORD: opts.db.db.password,
      SESSION_SECRET: opts.sessionSecret,
      RATE_LIMITS: 'false',
      UPLOADS_DIR: opts.uploads,
      ...opts.env,
    },
  });
  let out = '';
  const listeners = new Set<() => void>();
  const onData = (chunk: Buffer) => {
    out += chunk.toString();
    for (const l of listeners) l();
  };
  child.stdout!.on('data', onData);
  child.stderr!.on('data', onData);
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once('exit', (code, signal) => resolve({ code, signal })),
  );
  const waitForOutput = (pattern: RegExp, timeoutMs = 10_000) =>
    new Promise<void>((resolve, reject) => {
      const check = () => {
        if (pattern.test(out)) {
          cleanup();
          resolve();
        }
      };
      const timer = setTimeout(() => {
        cleanup();
        reject(new Error(`no ${pattern} in server output within ${timeoutMs} ms:\n${out.slice(-2000)}`));
      }, timeoutMs);
      const gone = () => {
        cleanup();
        reject(new Error(`server exited while waiting for ${pattern}:\n${out.slice(-2000)}`));
      };
      const cleanup = () => {
        clearTimeout(timer);
        listeners.delete(check);
        child.off('exit', gone);
      };
      listeners.add(check);
      child.once('exit', gone);
      check();
    });
  const server: RunningServer = {
    port,
    base: `http://127.0.0.1:${port}`,
    child,
    output: () => out,
    exited,
    waitForOutput,
    async stop() {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
      await exited;
    },
  };
  try {
    await waitForOutput(/Scanwright is running/, opts.startTimeoutMs ?? 45_000);
  } catch (err) {
    await server.stop();
    throw err;
  }
  return server;
}
