// `npm run cluster`: Scanwright past one machine, on loopback — three MariaDB Galera nodes, haproxy in front of
// them (TCP, one writer at a time, health-checked on each node's wsrep state) and in front of two app instances
// (HTTP, health-checked on /api/ready), an S3 stand-in (s3rver) for photo files, and the OAuth stand-in and SMTP
// catcher once for both instances. Same migrations and demo seed as `npm start`. Every node and app instance is
// restarted when it dies (scripts/lib/supervisor.mjs); Ctrl-C stops everything. docs/deploy/cluster.md explains it.
import { spawn, execFile } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { connect } from 'node:net';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { ensureDebianPackages, ensureNodeModules } from './lib/setup.mjs';
import { DATA_DIR, localSecrets, clientBuildIsStale, serverBuildIsStale } from './lib/paths.mjs';
import { running, stopChild, waitExit, pidAlive } from './lib/processes.mjs';
import { supervise } from './lib/supervisor.mjs';
import {
  NODES,
  chooseBootstrapNode,
  clientPort,
  ensureClusterDatabase,
  initNode,
  nodeSocket,
  startNode,
  untilEvicted,
} from './lib/galera.mjs';
import { buildServer } from './build-server.mjs';
import { CLUSTER_PORTS } from './lib/cluster-run.mjs';

const log = (line) => process.stdout.write(`[cluster] ${line}\n`);

const PORTS = CLUSTER_PORTS;
const BUCKET = 'scanwright-photos';
const S3_KEY = 'S3RVER'; // s3rver's built-in access key and secret

ensureDebianPackages({ cluster: true });
ensureNodeModules();
// An npm package: imported only once node_modules is there (a fresh clone has none before the line above).
const { default: S3rver } = await import('s3rver');

const root = join(DATA_DIR, 'cluster');
mkdirSync(root, { recursive: true });
const pidFile = join(root, 'cluster.pid');
if (existsSync(pidFile)) {
  const old = Number(readFileSync(pidFile, 'utf8'));
  if (old && old !== process.pid && pidAlive(old)) {
    log(`Another npm run cluster is running from ${root} (pid ${old}). Stop it first (kill ${old}).`);
    process.exit(1);
  }
}
writeFileSync(pidFile, String(process.pid));

const secrets = localSecrets();
const db = { database: 'scanwright', user: 'scanwright', password: secrets.dbPassword };
const appEnv = {
  ...process.env,
  NODE_ENV: process.env.NODE_ENV ?? 'production',
  DB_HOST: '127.0.0.1',
  DB_PORT: String(PORTS.dbProxy),
  DB_NAME: db.database,
  DB_USER: db.user,
  DB_PASSWORD: db.password,
  SESSION_SECRET: process.env.SESSION_SECRET ?? secrets.sessionSecret,
  PUBLIC_URL: `http://127.0.0.1:${PORTS.web}`,
  S3_BUCKET: BUCKET,
  S3_ENDPOINT: `http://127.0.0.1:${PORTS.s3}`,
  S3_ACCESS_KEY_ID: S3_KEY,
  S3_SECRET_ACCESS_KEY: S3_KEY,
  RATE_LIMIT_STORE: 'mariadb',
  // haproxy adds X-Forwarded-For: limits per address count the visitor, not the proxy.
  TRUST_PROXY: '1',
  STAND_INS: 'external',
  OAUTH_STANDIN_PORT: String(PORTS.oauth),
  SMTP_CATCHER_PORT: String(PORTS.smtp),
  INBOX_PORT: String(PORTS.inbox),
  SMTP_URL: `smtp://127.0.0.1:${PORTS.smtp}`,
  UPLOADS_DIR: join(root, 'uploads'),
  AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
};

let stopping = false;
const live = { nodes: new Map(), apps: new Map(), step: null, haproxy: null, standIns: null };
const sups = [];
let s3 = null;
let checkServers = [];

/** Where the faults script finds the processes it kills (rewritten on every start and restart). */
function writePids() {
  const pids = {
    supervisor: process.pid,
    nodes: Object.fromEntries([...live.nodes].map(([i, c]) => [i, c.pid])),
    apps: Object.fromEntries([...live.apps].map(([port, c]) => [port, c.pid])),
  };
  writeFileSync(join(root, 'pids.json'), JSON.stringify(pids));
}

async function shutdown(code, why) {
  if (stopping) return;
  stopping = true;
  if (why) log(why);
  for (const s of sups) s.cancel();
  await stopChild(live.step, { graceMs: 5000 });
  // Apps first (they drain: at most 10 s), then what they use; the database nodes last, node 1 last of all, so it is
  // the one marked safe to bootstrap the next start.
  await Promise.all(
    [...live.apps.values()].map(async (c) => {
      if (!running(c)) return;
      c.kill('SIGTERM');
      if (!(await waitExit(c, 15_000))) c.kill('SIGKILL');
      await waitExit(c, 5000);
    }),
  );
  await stopChild(live.haproxy, { graceMs: 5000 });
  await stopChild(live.standIns, { graceMs: 5000 });
  for (const srv of checkServers) srv.close();
  await s3?.close().catch(() => undefined);
  for (const i of [...NODES].reverse()) {
    const c = live.nodes.get(i);
    if (running(c)) await stopChild(c, { graceMs: 60_000 });
  }
  log('Everything stopped.');
  rmSync(join(root, 'pids.json'), { force: true });
  rmSync(pidFile, { force: true });
  process.exit(code);
}
let signals = 0;
function onSignal(signal) {
  signals += 1;
  if (signals === 1) return void shutdown(0, `${signal}: stopping …`);
  log(`${signal} again: killing everything now.`);
  for (const c of [live.step, live.haproxy, live.standIns, ...live.apps.values(), ...live.nodes.values()])
    if (running(c)) c.kill('SIGKILL');
  process.exit(130);
}
for (const sig of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(sig, () => onSignal(sig));

/** Run one preparation step as a child; resolves with its exit code. */
async function step(command, args, env = appEnv) {
  live.step = spawn(command, args, { stdio: 'inherit', env });
  const child = live.step;
  await waitExit(child, 24 * 3600_000);
  live.step = null;
  return child.exitCode ?? 1;
}

/** Node i is Synced and ready, asked over its socket (async: haproxy checks each node twice a second). */
const nodeSynced = (i) =>
  new Promise((resolve) => {
    execFile(
      'mariadb',
      [
        '--no-defaults',
        `--socket=${nodeSocket(root, i)}`,
        '-uroot',
        '-N',
        '-B',
        '-e',
        "SHOW STATUS WHERE Variable_name IN ('wsrep_local_state','wsrep_ready')",
      ],
      { timeout: 1500 },
      (err, stdout) => {
        if (err) return resolve(false);
        const v = Object.fromEntries(
          stdout
            .trim()
            .split('\n')
            .map((l) => l.split('\t')),
        );
        resolve(v.wsrep_local_state === '4' && v.wsrep_ready === 'ON');
      },
    );
  });

/** One small HTTP check per node for haproxy: 200 when the node is Synced, else 503 (a joiner or donor gets no traffic). */
function startNodeChecks() {
  checkServers = NODES.map((i, k) =>
    createServer((_req, res) => {
      void nodeSynced(i).then((ok) => {
        res.statusCode = ok ? 200 : 503;
        res.end(ok ? 'synced\n' : 'not synced\n');
      });
    }).listen(PORTS.nodeChecks[k], '127.0.0.1'),
  );
}

function haproxyConfig() {
  const nodes = NODES.map(
    (i, k) => `  server n${i} 127.0.0.1:${clientPort(i)} check port ${PORTS.nodeChecks[k]}${k === 0 ? '' : ' backup'}`,
  ).join('\n');
  const apps = PORTS.apps.map((p, k) => `  server app${k + 1} 127.0.0.1:${p} check`).join('\n');
  return `global
  maxconn 4000
defaults
  timeout connect 2s
  timeout client 1h
  timeout server 1h
  timeout check 2s
# The database: one node takes every connection, the others are hot standbys. Writes on several nodes at once would
# only add certification conflicts; the write wrapper retries them, but there is nothing to gain on one machine.
# A node counts as up only while it is Synced (HTTP check on its state); when it goes down its connections are cut,
# so the app's pool reconnects to the next node at once.
frontend db
  mode tcp
  bind 127.0.0.1:${PORTS.dbProxy}
  default_backend galera
backend galera
  mode tcp
  option httpchk GET /
  default-server inter 500ms fall 2 rise 2 on-marked-down shutdown-sessions
${nodes}
# The app instances, health-checked on /api/ready (503 while draining or when the database is away).
frontend web
  mode http
  bind 127.0.0.1:${PORTS.web}
  default_backend apps
backend apps
  mode http
  balance roundrobin
  option forwardfor
  option httpchk GET /api/ready
  http-check expect status 200
  default-server inter 500ms fall 2 rise 2
  # Only a connection that was refused is tried on the other instance: a request that reached an app is never sent twice.
  retry-on conn-failure
  retries 2
  option redispatch
${apps}
`;
}

function spawnLogged(name, command, args, env) {
  const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'pipe'], env });
  const prefix = (chunk) =>
    chunk
      .toString()
      .split('\n')
      .filter(Boolean)
      .map((l) => `[${name}] ${l}\n`)
      .join('');
  child.stdout.on('data', (c) => process.stdout.write(prefix(c)));
  child.stderr.on('data', (c) => process.stderr.write(prefix(c)));
  return child;
}

/** Wait until something answers HTTP 200 at url (or throw after ms). */
async function until200(url, ms) {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    const ok = await fetch(url)
      .then((r) => r.ok)
      .catch(() => false);
    if (ok) return;
    await sleep(200);
  }
  throw new Error(`${url} did not answer 200 within ${ms / 1000} s`);
}

/** Resolves once a connection to the database proxy gets a MariaDB greeting (haproxy is up and has a node). */
async function untilProxyGreets(ms) {
  const deadline = Date.now() + ms;
  const greets = () =>
    new Promise((resolve) => {
      const socket = connect(PORTS.dbProxy, '127.0.0.1');
      const done = (ok) => {
        socket.destroy();
        resolve(ok);
      };
      socket.setTimeout(1000, () => done(false));
      socket.once('data', () => done(true));
      socket.once('error', () => done(false));
      socket.once('close', () => done(false));
    });
  while (Date.now() < deadline) {
    if (!running(live.haproxy)) throw new Error(`haproxy exited with ${live.haproxy?.exitCode} (its messages are above)`);
    if (await greets()) return;
    await sleep(200);
  }
  throw new Error(`the database proxy on :${PORTS.dbProxy} did not answer within ${ms / 1000} s`);
}

function startApp(port) {
  const child = spawnLogged(`app:${port}`, process.execPath, ['--enable-source-maps', 'dist/server/index.mjs'], {
    ...appEnv,
    PORT: String(port),
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
  });
  live.apps.set(port, child);
  writePids();
  return child;
}

try {
  // 1. The database nodes: the bootstrap node first, then the others join (state transfer by rsync).
  const fresh = NODES.map((i) => initNode(root, i)).some(Boolean);
  if (fresh) log(`Initialised Galera data directories under ${root}`);
  const first = chooseBootstrapNode(root);
  const order = [first, ...NODES.filter((i) => i !== first)];
  for (const [k, i] of order.entries()) {
    let bootstrap = k === 0;
    let restart = false;
    const sup = supervise({
      name: `Galera node ${i}`,
      start: async () => {
        // A node that died rejoins only once the others have evicted it (scripts/lib/galera.mjs, untilEvicted).
        if (restart) {
          const since = Date.now();
          const evicted = await untilEvicted(root, i, { shouldStop: () => stopping });
          if (stopping) throw new Error('stopping');
          log(
            evicted
              ? `Galera node ${i} is out of the others' view (waited ${((Date.now() - since) / 1000).toFixed(1)} s); starting it again.`
              : `Galera node ${i} is still a member for the others after 15 s; starting it anyway.`,
          );
        }
        restart = true;
        const child = await startNode(root, i, {
          bootstrap,
          onSpawn: (c) => {
            live.nodes.set(i, c);
            writePids();
          },
        });
        // A restarted node joins the running cluster; it never bootstraps a second one.
        bootstrap = false;
        log(`Galera node ${i} is Synced (client port ${clientPort(i)}).`);
        return child;
      },
      stopping: () => stopping,
      onGiveUp: () => void shutdown(1, `Galera node ${i} would not come back; stopping.`),
      log,
    });
    sups.push(sup);
    await sup.first();
    if (k === 0) ensureClusterDatabase(root, i, db);
  }

  // 2. The proxy's node checks, the S3 stand-in, the shared OAuth stand-in and SMTP catcher, and haproxy.
  startNodeChecks();
  s3 = new S3rver({
    port: PORTS.s3,
    address: '127.0.0.1',
    silent: true,
    directory: join(root, 's3'),
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  await s3.run();
  if (serverBuildIsStale() || !existsSync('dist/server/stand-ins.mjs')) {
    log('Building the server …');
    await buildServer();
  }
  live.standIns = spawnLogged('stand-ins', process.execPath, ['dist/server/stand-ins.mjs'], appEnv);
  const cfg = join(root, 'haproxy.cfg');
  writeFileSync(cfg, haproxyConfig());
  live.haproxy = spawnLogged('haproxy', 'haproxy', ['-f', cfg, '-db'], appEnv);
  await until200(`http://127.0.0.1:${PORTS.nodeChecks[0]}/`, 10_000);
  await untilProxyGreets(30_000);

  // 3. Migrations and the demo seed through the proxy (photos go to the bucket), the client build, then the apps.
  if ((await step(process.execPath, ['--enable-source-maps', 'dist/server/prepare.mjs'])) !== 0)
    throw new Error('migrations or seeding failed');
  if (process.env.SCANWRIGHT_SKIP_CLIENT_BUILD !== '1' && clientBuildIsStale()) {
    log('Building the client …');
    if ((await step('npx', ['vite', 'build', '--logLevel', 'warn'])) !== 0) throw new Error('client build failed');
  }
  for (const port of PORTS.apps) {
    const sup = supervise({
      name: `app instance :${port}`,
      start: async () => startApp(port),
      stopping: () => stopping,
      onGiveUp: () => void shutdown(1, `App instance :${port} kept failing; stopping.`),
      log,
    });
    sups.push(sup);
    await sup.first();
  }
  await until200(`http://127.0.0.1:${PORTS.web}/api/ready`, 60_000);
} catch (err) {
  await shutdown(1, `The cluster did not start: ${err instanceof Error ? err.message : err}`);
}

if (!stopping) {
  process.stdout.write(
    [
      '',
      '  Scanwright cluster is running',
      `  App (haproxy)   http://127.0.0.1:${PORTS.web}  → instances :${PORTS.apps.join(', :')}`,
      `  Database        haproxy 127.0.0.1:${PORTS.dbProxy} → Galera nodes :${NODES.map(clientPort).join(', :')}`,
      `  Photos          s3rver http://127.0.0.1:${PORTS.s3} bucket ${BUCKET}`,
      `  Sign-in         stand-in http://127.0.0.1:${PORTS.oauth}   Mail inbox http://127.0.0.1:${PORTS.inbox}`,
      `  Data            ${root}`,
      '  Stop            Ctrl-C',
      '',
      'cluster ready',
      '',
    ].join('\n'),
  );
}
