// One backup archive (<prefix><database>-<UTC time>.tar.gz) holds:
//   manifest.json  what a restore or `npm run db:verify` checks against: row counts per table (counted in
//                  the dump itself, so they match it exactly), applied migrations, app version, the dump's and
//                  every upload file's size and sha256;
//   database.sql   mariadb-dump --single-transaction (one consistent snapshot, no table locks);
//   uploads/…      the upload files as they were when the archive was made.
// Written to a .partial file and renamed when complete, so a failed backup never looks like one.
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { createReadStream, existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { createInterface } from 'node:readline';
import { ROOT } from './paths.mjs';

export const MANIFEST_FORMAT = 'scanwright-backup/1';
export const ARCHIVE_RE = /^(?<prefix>[a-z-]*?)(?<database>[A-Za-z0-9_]+)-(?<stamp>\d{4}-\d\d-\d\dT\d\d-\d\d-\d\dZ)\.tar\.gz$/;

/** Root over the server's own socket, never reading /etc/mysql. */
export const rootArgs = (socket) => ['--no-defaults', `--socket=${socket}`, '--user=root', '--default-character-set=utf8mb4'];

/** 2026-12-01T23-30-05Z: sortable and safe in file names. */
export const stamp = (d = new Date()) =>
  d
    .toISOString()
    .replace(/\.\d+Z$/, 'Z')
    .replace(/:/g, '-');

/** Run a child to completion; rejects with its stderr when it fails. */
export function run(command, args, opts = {}) {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'pipe'], ...opts });
    let out = '';
    let err = '';
    child.stdout?.on('data', (c) => (out += c));
    child.stderr?.on('data', (c) => (err += c));
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolvePromise(out) : reject(new Error(`${command} failed (exit ${code}): ${err.trim()}`))));
  });
}

export async function sha256File(file) {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(file)) hash.update(chunk);
  return hash.digest('hex');
}

/** Every file under `dir` (relative paths, sorted); none when it does not exist. */
export function listFiles(dir) {
  if (!existsSync(dir)) return [];
  const out = [];
  const walk = (d) => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      const p = join(d, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.isFile()) out.push(relative(dir, p));
    }
  };
  walk(dir);
  return out.sort();
}

/** size and sha256 of each file under `dir`. */
export async function hashFiles(dir, names = listFiles(dir)) {
  const files = {};
  for (const name of names) {
    const p = join(dir, name);
    files[name] = { bytes: statSync(p).size, sha256: await sha256File(p) };
  }
  return files;
}

/**
 * Rows per table as written in a mariadb-dump file. An `INSERT INTO `t` VALUES` statement runs until a `;`
 * outside quotes (MariaDB 10.11 puts each row on a line of its own); strings are quoted with backslash
 * escapes, so a row is a `(` at depth 0 outside quotes.
 */
export async function countDumpRows(file) {
  const tables = {};
  const lines = createInterface({ input: createReadStream(file, { encoding: 'utf8' }), crlfDelay: Infinity });
  let table = null;
  let depth = 0;
  let quoted = false;
  for await (const line of lines) {
    let from = 0;
    if (table === null) {
      const created = /^CREATE TABLE `((?:[^`]|``)+)`/.exec(line);
      if (created) tables[created[1].replace(/``/g, '`')] ??= 0;
      const insert = /^INSERT INTO `((?:[^`]|``)+)` VALUES/.exec(line);
      if (!insert) continue;
      table = insert[1].replace(/``/g, '`');
      tables[table] ??= 0;
      from = insert[0].length;
      depth = 0;
      quoted = false;
    }
    for (let i = from; i < line.length; i++) {
      const c = line.charCodeAt(i);
      if (quoted) {
        if (c === 92) i++;
        else if (c === 39) quoted = false;
      } else if (c === 39) quoted = true;
      else if (c === 40) {
        if (depth === 0) tables[table]++;
        depth++;
      } else if (c === 41) depth--;
      else if (c === 59 && depth === 0) {
        table = null;
        break;
      }
    }
  }
  return tables;
}

function appVersion() {
  const version = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')).version;
  const git = spawnSync('git', ['rev-parse', '--short', 'HEAD'], { cwd: ROOT, encoding: 'utf8' });
  return { name: 'scanwright', version, commit: git.status === 0 ? git.stdout.trim() : null };
}

/** Dump `database` to `file` in one consistent snapshot. */
export async function dumpDatabase({ socket, database }, file) {
  const args = [
    ...rootArgs(socket),
    `--result-file=${file}`,
    '--single-transaction',
    '--routines',
    '--triggers',
    '--events',
    '--hex-blob',
    '--tz-utc',
    '--add-drop-table',
    '--quick',
    '--skip-dump-date',
    database,
  ];
  await run('mariadb-dump', args);
}

function sql({ socket }, statement, database) {
  const r = spawnSync(
    'mariadb',
    [...rootArgs(socket), '--batch', '--skip-column-names', '-e', statement, ...(database ? [database] : [])],
    {
      encoding: 'utf8',
    },
  );
  if (r.status !== 0) throw new Error(`MariaDB refused: ${r.stderr.trim()}`);
  return r.stdout;
}

/**
 * Make one archive: dump, uploads and manifest. Resolves with `{ file, manifest }`.
 * @param {{ socket: string, database: string, backupDir: string, uploadsDir: string }} target
 */
export async function createBackup(target, prefix = '') {
  const { database, backupDir } = target;
  const uploadsDir = resolve(target.uploadsDir);
  mkdirSync(backupDir, { recursive: true, mode: 0o700 });
  const at = new Date();
  const name = `${prefix}${database}-${stamp(at)}.tar.gz`;
  const file = join(backupDir, name);
  const staging = join(backupDir, `.staging-${process.pid}-${Date.now()}`);
  mkdirSync(staging, { recursive: true, mode: 0o700 });
  const partial = `${file}.partial`;
  try {
    const dump = join(staging, 'database.sql');
    await dumpDatabase(target, dump);
    const tables = await countDumpRows(dump);
    let migrations = [];
    try {
      migrations = sql(target, 'SELECT name FROM schema_migrations ORDER BY name', database).split('\n').filter(Boolean);
    } catch {
      /* a database without migrations */
    }
    const uploadNames = listFiles(uploadsDir);
    const manifest = {
      format: MANIFEST_FORMAT,
      createdAt: at.toISOString(),
      app: appVersion(),
      database,
      dump: { file: 'database.sql', bytes: statSync(dump).size, sha256: await sha256File(dump) },
      tables,
      migrations,
      uploads: await hashFiles(uploadsDir, uploadNames),
    };
    writeFileSync(join(staging, 'manifest.json'), `${JSON.stringify(manifest, null, 2)}\n`);
    const list = join(staging, 'uploads.list');
    writeFileSync(list, uploadNames.map((n) => `./${n}\n`).join(''));
    const args = ['-czf', partial, '-C', staging, 'manifest.json', 'database.sql'];
    if (uploadNames.length) args.push('-C', uploadsDir, '--transform', 's,^\\./,uploads/,', '-T', list);
    await run('tar', args);
    renameSync(partial, file);
    return { file, manifest };
  } finally {
    rmSync(partial, { force: true });
    rmSync(staging, { recursive: true, force: true });
  }
}

/** Unpack an archive into `dir`; resolves with its manifest. */
export async function extractArchive(file, dir) {
  mkdirSync(dir, { recursive: true });
  await run('tar', ['-xzf', file, '-C', dir]);
  const mf = join(dir, 'manifest.json');
  if (!existsSync(mf)) throw new Error(`${file} has no manifest.json: not a Scanwright backup archive`);
  const manifest = JSON.parse(readFileSync(mf, 'utf8'));
  if (manifest.format !== MANIFEST_FORMAT) throw new Error(`${file}: unknown manifest format ${manifest.format}`);
  return manifest;
}

/** What in an unpacked archive differs from its manifest (dump checksum, upload files): a list of lines. */
export async function checkExtracted(dir, manifest) {
  const problems = [];
  const dump = join(dir, manifest.dump.file);
  if (!existsSync(dump)) problems.push('database.sql is missing');
  else if ((await sha256File(dump)) !== manifest.dump.sha256) problems.push('database.sql: sha256 differs from the manifest');
  const found = await hashFiles(join(dir, 'uploads'));
  for (const [name, want] of Object.entries(manifest.uploads)) {
    const got = found[name];
    if (!got) problems.push(`uploads/${name}: missing`);
    else if (got.sha256 !== want.sha256 || got.bytes !== want.bytes) problems.push(`uploads/${name}: content differs (sha256)`);
  }
  for (const name of Object.keys(found)) if (!manifest.uploads[name]) problems.push(`uploads/${name}: not in the manifest`);
  return problems;
}

/** Archives in `backupDir`, newest first (`{ name, file, prefix, at }`). */
export function listArchives(backupDir) {
  if (!existsSync(backupDir)) return [];
  return readdirSync(backupDir)
    .map((name) => ({ name, m: ARCHIVE_RE.exec(name) }))
    .filter(({ m }) => m)
    .map(({ name, m }) => ({
      name,
      file: join(backupDir, name),
      prefix: m.groups.prefix,
      database: m.groups.database,
      at: new Date(m.groups.stamp.replace(/T(\d\d)-(\d\d)-(\d\d)Z$/, 'T$1:$2:$3Z')),
    }))
    .sort((a, b) => b.at - a.at);
}
