// The cluster's ports, and `npm run cluster` as a child process for the scripts that measure or break it
// (cluster:faults, bench:cluster): started with its own data directory, ready when it prints "cluster ready",
// stopped with SIGINT (its own clean shutdown: apps, proxy, stand-ins, then the Galera nodes, node 1 last).
import { spawn } from 'node:child_process';
import { running, stopChild, waitExit } from './processes.mjs';

/** Every port of the cluster (docs/deploy/cluster.md). */
export const CLUSTER_PORTS = {
  web: 3100,
  apps: [3110, 3111],
  dbProxy: 3510,
  nodeChecks: [3514, 3515, 3516],
  s3: 3520,
  oauth: 3121,
  smtp: 3122,
  inbox: 3123,
};

/**
 * Start scripts/cluster.mjs with SCANWRIGHT_DATA_DIR=dataDir (its data under dataDir/cluster) and `env` on top of
 * this process's. `onOutput(chunk)` sees everything it prints on stdout. `ready` resolves at "cluster ready" and
 * rejects when the cluster exits first; `stop()` stops it and everything it started.
 */
export function startClusterChild({ dataDir, env = {}, onOutput = () => {} }) {
  const child = spawn(process.execPath, ['scripts/cluster.mjs'], {
    env: { ...process.env, ...env, SCANWRIGHT_DATA_DIR: dataDir },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  let out = '';
  const ready = new Promise((resolve, reject) => {
    child.stdout.on('data', (c) => {
      out = (out + c).slice(-20_000);
      onOutput(c);
      if (out.includes('cluster ready')) resolve();
    });
    child.once('exit', (code) => reject(new Error(`npm run cluster exited with ${code}:\n${out.slice(-2000)}`)));
  });
  // A caller that stops before "cluster ready" need not handle the rejection.
  ready.catch(() => undefined);
  return {
    child,
    ready,
    async stop() {
      if (!running(child)) return;
      child.kill('SIGINT');
      if (!(await waitExit(child, 90_000))) await stopChild(child, { graceMs: 5000 });
    },
  };
}
