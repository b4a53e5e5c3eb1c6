// Installs what a fresh Debian 12 machine is missing: Debian packages (as root) and node_modules.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { mariadbTools } from './mariadb.mjs';

const run = (cmd, args, opts = {}) => spawnSync(cmd, args, { stdio: 'inherit', ...opts });
const has = (cmd) => spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;

/**
 * Install Debian packages with apt-get when root; otherwise say exactly what to install. `cluster` (npm run cluster)
 * also needs Galera's provider, rsync for its state transfers and haproxy.
 */
export function ensureDebianPackages({ chromium = false, cluster = false } = {}) {
  const missing = [];
  if (!mariadbTools()) missing.push('mariadb-server', 'mariadb-client');
  if (cluster) {
    if (!existsSync('/usr/lib/galera/libgalera_smm.so')) missing.push('galera-4');
    if (!has('rsync')) missing.push('rsync');
    if (!has('haproxy') && !existsSync('/usr/sbin/haproxy')) missing.push('haproxy');
  }
  if (chromium && !existsSync('/usr/bin/chromium')) missing.push('chromium');
  if (missing.length === 0) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || !has('apt-get')) {
    console.error(
      `\nScanwright needs these Debian packages: ${missing.join(' ')}\nInstall them as root:\n  apt-get update && apt-get install -y --no-install-recommends ${missing.join(' ')}\n`,
    );
    process.exit(1);
  }
  console.log(`Installing Debian packages: ${missing.join(' ')} …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (run('apt-get', ['update', '-qq'], { env }).status !== 0) process.exit(1);
  const r = run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...missing], { env });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

const lockHash = () => createHash('sha256').update(readFileSync('package-lock.json')).digest('hex');
const STAMP = 'node_modules/.scanwright-lock-hash';

/**
 * Run `npm ci` when node_modules is missing or older than package-lock.json. Development packages are
 * included even under NODE_ENV=production (npm would leave them out): the server and client builds need them.
 * SCANWRIGHT_SKIP_INSTALL=1 skips this (tests never reinstall the shared node_modules). `--prefer-offline` takes
 * package metadata from npm's cache when it is there instead of asking the registry again (the lock file pins every
 * version and checksum either way): 16 s instead of 29 s on a machine that has installed before.
 */
export function ensureNodeModules() {
  if (process.env.SCANWRIGHT_SKIP_INSTALL === '1') return;
  const hash = lockHash();
  if (existsSync(STAMP) && readFileSync(STAMP, 'utf8') === hash) return;
  console.log('Installing npm packages (npm ci) …');
  const r = run('npm', ['ci', '--include=dev', '--no-audit', '--no-fund', '--prefer-offline']);
  if (r.status !== 0) process.exit(r.status ?? 1);
  writeFileSync(STAMP, hash);
}
