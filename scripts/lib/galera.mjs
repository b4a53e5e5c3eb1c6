// A three-node MariaDB Galera cluster on loopback for `npm run cluster` (Debian's mariadb-server with galera-4):
// each node has its own data directory under .data/cluster/n<i>/, owned by and run as the `mysql` user (as root,
// the joiner's rsync SST daemon drops to `nobody` and state transfer fails), every tool with --no-defaults.
// Ports of node i (1…3): client 351i, group communication 45i7, IST 45i8, SST 45i9 (i = 6, 7, 8 for nodes 1, 2, 3).
import { execFile, spawn, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { initDataDir, serverArgs } from './mariadb.mjs';

export const NODES = [1, 2, 3];
export const clientPort = (i) => 3510 + i;
const groupPort = (i) => 4557 + 10 * i;
const CLUSTER_ADDRESS = `gcomm://${NODES.map((i) => `127.0.0.1:${groupPort(i)}`).join(',')}`;
const PROVIDER = '/usr/lib/galera/libgalera_smm.so';

export const nodeDir = (root, i) => join(root, `n${i}`);
export const nodeSocket = (root, i) => join(nodeDir(root, i), 'mysqld.sock');

function mysqlIds() {
  const r = spawnSync('id', ['-u', 'mysql'], { encoding: 'utf8' });
  const g = spawnSync('id', ['-g', 'mysql'], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error('no `mysql` user: install mariadb-server (it creates the user)');
  return { uid: Number(r.stdout), gid: Number(g.stdout) };
}

function chownTree(path, { uid, gid }) {
  chownSync(path, uid, gid);
  if (statSync(path).isDirectory()) for (const name of readdirSync(path)) chownTree(join(path, name), { uid, gid });
}

/** Make node i's data directory once (mariadb-install-db as mysql); true when it was new. */
export function initNode(root, i) {
  const dir = nodeDir(root, i);
  if (existsSync(join(dir, 'data', 'mysql'))) return false;
  mkdirSync(join(dir, 'data'), { recursive: true });
  const ids = mysqlIds();
  chownTree(dir, ids);
  try {
    initDataDir(dir, { user: 'mysql' });
  } catch (err) {
    throw new Error(`node ${i}: ${err.message}`, { cause: err });
  }
  chownTree(dir, ids);
  return true;
}

/** Node i's saved Galera state (grastate.dat): its last committed seqno and whether it may bootstrap. */
function grastate(root, i) {
  const file = join(nodeDir(root, i), 'data', 'grastate.dat');
  if (!existsSync(file)) return null;
  const text = readFileSync(file, 'utf8');
  return {
    file,
    text,
    seqno: Number(/^seqno:\s*(-?\d+)/m.exec(text)?.[1] ?? -1),
    safe: /^safe_to_bootstrap:\s*1/m.test(text),
  };
}

/**
 * Which node starts a new cluster (`--wsrep-new-cluster`): node 1 on a fresh set-up; after a clean stop the node
 * marked safe_to_bootstrap (the last to stop); after a crash of all, the one with the highest seqno, marked safe.
 */
export function chooseBootstrapNode(root) {
  const states = NODES.map((i) => ({ i, s: grastate(root, i) }));
  if (states.every(({ s }) => s === null)) return 1;
  const safe = states.find(({ s }) => s?.safe);
  if (safe) return safe.i;
  const best = states.filter(({ s }) => s).sort((a, b) => b.s.seqno - a.s.seqno)[0];
  writeFileSync(best.s.file, best.s.text.replace(/^safe_to_bootstrap:\s*0/m, 'safe_to_bootstrap: 1'));
  return best.i;
}

/** mariadbd arguments of node i. Eviction of an unreachable peer after about 3 s (evs.* timeouts), not Galera's ~6 s. */
function nodeArgs(root, i, { bootstrap }) {
  const dir = nodeDir(root, i);
  const provider = [
    `gmcast.listen_addr=tcp://127.0.0.1:${groupPort(i)}`,
    `ist.recv_addr=127.0.0.1:${groupPort(i) + 1}`,
    'evs.keepalive_period=PT0.5S',
    'evs.inactive_check_period=PT0.5S',
    'evs.suspect_timeout=PT2S',
    'evs.inactive_timeout=PT3S',
    'gcache.size=64M',
  ].join(';');
  return [
    ...serverArgs({ dir, port: clientPort(i), user: 'mysql' }),
    '--innodb-buffer-pool-size=64M',
    // Durability comes from the other nodes holding each commit; flushing the log once a second is enough here.
    '--innodb-flush-log-at-trx-commit=2',
    '--binlog-format=ROW',
    '--default-storage-engine=InnoDB',
    // Interleaved auto-increment locks: required by Galera; ids stay unique (each node steps by the cluster size).
    '--innodb-autoinc-lock-mode=2',
    '--wsrep-on=ON',
    `--wsrep-provider=${PROVIDER}`,
    '--wsrep-cluster-name=scanwright',
    `--wsrep-cluster-address=${CLUSTER_ADDRESS}`,
    `--wsrep-node-address=127.0.0.1:${groupPort(i)}`,
    `--wsrep-node-name=n${i}`,
    // What wsrep_incoming_addresses lists for this node (else "AUTO"); untilEvicted looks for it there.
    `--wsrep-node-incoming-address=127.0.0.1:${clientPort(i)}`,
    `--wsrep-provider-options=${provider}`,
    `--wsrep-sst-receive-address=127.0.0.1:${groupPort(i) + 2}`,
    '--wsrep-sst-method=rsync',
    ...(bootstrap ? ['--wsrep-new-cluster'] : []),
  ];
}

/** Run SQL as root over node i's socket; returns stdout (tab-separated, no headers) or throws. */
export function nodeSql(root, i, sql) {
  const r = spawnSync('mariadb', ['--no-defaults', `--socket=${nodeSocket(root, i)}`, '-uroot', '-N', '-B', '-e', sql], {
    encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(`node ${i}: ${r.stderr.trim()}`);
  return r.stdout;
}

/** Node i's wsrep state: `synced` is true when it is Synced (4) in the primary component and ready for queries. */
export function nodeState(root, i) {
  try {
    const rows = nodeSql(
      root,
      i,
      "SHOW STATUS WHERE Variable_name IN ('wsrep_local_state', 'wsrep_ready', 'wsrep_cluster_size', 'wsrep_cluster_status')",
    );
    const v = Object.fromEntries(
      rows
        .trim()
        .split('\n')
        .map((l) => l.split('\t')),
    );
    return {
      synced: v.wsrep_local_state === '4' && v.wsrep_ready === 'ON' && v.wsrep_cluster_status === 'Primary',
      size: Number(v.wsrep_cluster_size ?? 0),
    };
  } catch {
    return { synced: false, size: 0 };
  }
}

/** The members' client addresses (`host:port`) in the view of node j, or null when it does not answer. */
const membersSeenBy = (root, j) =>
  new Promise((resolve) => {
    execFile(
      'mariadb',
      ['--no-defaults', `--socket=${nodeSocket(root, j)}`, '-uroot', '-N', '-B', '-e', "SHOW STATUS LIKE 'wsrep_incoming_addresses'"],
      { timeout: 1500 },
      (err, stdout) => resolve(err ? null : (stdout.trim().split('\t')[1] ?? '').split(',').filter(Boolean)),
    );
  });

/**
 * Before node i starts again after it died: wait until no other node still counts its previous incarnation as a
 * member. Galera evicts a dead node only after evs.inactive_timeout; a new incarnation on the same address joining
 * before that makes the membership change fail over and over, until the survivors fall to a non-primary component and
 * take no writes (seen: 8 s without a primary after a writer was killed and restarted 0.5 s later). Gives up waiting
 * after `timeoutMs` or when `shouldStop()` says so.
 */
export async function untilEvicted(root, i, { timeoutMs = 15_000, shouldStop = () => false } = {}) {
  const address = `127.0.0.1:${clientPort(i)}`;
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline && !shouldStop()) {
    const views = await Promise.all(NODES.filter((j) => j !== i).map((j) => membersSeenBy(root, j)));
    if (!views.some((members) => members?.includes(address))) return true;
    await sleep(250);
  }
  return false;
}

/** Start node i; resolves with the child once it is Synced (or throws with the end of its error log). */
export async function startNode(root, i, { bootstrap = false, onSpawn, timeoutMs = 120_000 } = {}) {
  const dir = nodeDir(root, i);
  const child = spawn('mariadbd', nodeArgs(root, i, { bootstrap }), { stdio: 'ignore' });
  onSpawn?.(child);
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) {
      let tail = '';
      try {
        tail = readFileSync(join(dir, 'error.log'), 'utf8').split('\n').slice(-15).join('\n');
      } catch {
        /* none */
      }
      throw new Error(`node ${i} (mariadbd) exited with ${child.exitCode ?? child.signalCode}:\n${tail}`);
    }
    if (nodeState(root, i).synced) return child;
    await sleep(200);
  }
  child.kill('SIGKILL');
  throw new Error(`node ${i} did not become Synced within ${timeoutMs / 1000} s`);
}

/** Create the database and a password user for 127.0.0.1 (replicated to every node: DDL runs on all of them). */
export function ensureClusterDatabase(root, i, { database, user, password }) {
  nodeSql(
    root,
    i,
    `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';
     ALTER USER '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';
     GRANT ALL PRIVILEGES ON \`${database}\`.* TO '${user}'@'127.0.0.1';`,
  );
}
