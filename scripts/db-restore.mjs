// `npm run db:restore FILE [--yes]`: replace the app's database with a backup made by db:backup,
// on the private MariaDB that `npm start` runs. Says what it will overwrite, asks first (or takes
// --yes), and saves the current contents to a pre-restore backup before touching anything.
import { spawn, spawnSync } from 'node:child_process';
import { closeSync, existsSync, openSync, readdirSync, readSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { createInterface } from 'node:readline/promises';
import { backup, dbTarget, fail, requireRunningServer, rootArgs } from './db-backup.mjs';

const args = process.argv.slice(2);
const yes = args.includes('--yes') || args.includes('-y') || process.env.npm_config_yes === 'true';
const fileArg = args.find((a) => !a.startsWith('-'));
const target = dbTarget();
const q = (name) => `\`${name.replace(/`/g, '``')}\``;

if (!fileArg) {
  let listing = '';
  if (existsSync(target.backupDir)) {
    const files = readdirSync(target.backupDir)
      .filter((f) => f.endsWith('.sql'))
      .sort()
      .reverse()
      .slice(0, 10);
    if (files.length)
      listing = `\nBackups in ${target.backupDir} (newest first):\n${files.map((f) => `  ${join(target.backupDir, f)}`).join('\n')}\n`;
  }
  fail(`Refusing to restore without a file.\nUsage: npm run db:restore FILE [--yes]   (FILE from npm run db:backup)\n${listing}`, 2);
}

const file = resolve(fileArg);
if (!existsSync(file) || !statSync(file).isFile()) fail(`No such backup file: ${file}`);
// A dump from mariadb-dump opens with its banner (after the sandbox-mode line of newer versions)
// and, when complete, ends with "-- Dump completed".
const head = Buffer.alloc(300);
const tail = Buffer.alloc(200);
const fd = openSync(file, 'r');
readSync(fd, head, 0, head.length, 0);
readSync(fd, tail, 0, tail.length, Math.max(0, statSync(file).size - tail.length));
closeSync(fd);
if (!/^(\/\*M!999999\\- enable the sandbox mode \*\/ *\n)?-- (MariaDB|MySQL) dump/.test(head.toString('utf8')))
  fail(`${file} does not look like a mariadb-dump file; nothing was changed.`);
if (!tail.toString('utf8').includes('-- Dump completed'))
  fail(`${file} is incomplete (no "-- Dump completed" at the end); nothing was changed.`);

const exists = requireRunningServer(target);
const sql = (statement, database = '') => {
  const r = spawnSync(
    'mariadb',
    [...rootArgs(target.socket), '--batch', '--skip-column-names', '-e', statement, ...(database ? [database] : [])],
    { encoding: 'utf8' },
  );
  if (r.status !== 0) fail(`MariaDB refused: ${r.stderr.trim()}`);
  return r.stdout.trim();
};
const tableCounts = () => {
  const tables = sql(
    `SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA = '${target.database.replace(/'/g, "''")}' AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME`,
  )
    .split('\n')
    .filter(Boolean);
  if (!tables.length) return [];
  const counts = sql(tables.map((t) => `SELECT COUNT(*) FROM ${q(t)}`).join(' UNION ALL '), target.database).split('\n');
  return tables.map((t, i) => `${t} ${counts[i]}`);
};

const current = exists ? tableCounts() : [];
process.stdout.write(
  `This will OVERWRITE database ${q(target.database)} on ${target.socket}\n` +
    `with the backup ${file} (${(statSync(file).size / 1024).toFixed(1)} KiB, written ${statSync(file).mtime.toISOString()}).\n` +
    (current.length
      ? `Everything in it now is replaced (table rows):\n  ${current.join('\n  ')}\n`
      : 'The database is empty or missing now.\n') +
    'Sign-ins made after the backup are lost; a running app sees errors for the few seconds the restore takes.\n',
);

if (!yes) {
  if (!process.stdin.isTTY) fail('Not asking on a non-interactive input: add --yes to confirm.', 2);
  const rl = createInterface({ input: process.stdin, output: process.stdout });
  const answer = await rl.question(`Type the database name (${target.database}) to continue: `);
  rl.close();
  if (answer.trim() !== target.database) fail('Nothing was changed.', 1);
}

if (exists && current.length) {
  try {
    const saved = await backup(target, 'pre-restore-');
    process.stdout.write(`Saved the current contents first: ${saved}\n`);
  } catch (err) {
    fail(`Could not save the current contents, so nothing was changed: ${err instanceof Error ? err.message : err}`);
  }
}

sql(
  `DROP DATABASE IF EXISTS ${q(target.database)}; CREATE DATABASE ${q(target.database)} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
);
const code = await new Promise((done) => {
  const input = openSync(file, 'r');
  const child = spawn('mariadb', [...rootArgs(target.socket), '--binary-mode', target.database], { stdio: [input, 'inherit', 'inherit'] });
  child.on('error', () => done(-1));
  child.on('exit', (c) => {
    closeSync(input);
    done(c ?? 1);
  });
});
if (code !== 0)
  fail(
    `Loading ${file} failed (exit ${code}); the database is incomplete. Restore again from a good backup (the pre-restore one above, if any).`,
  );
process.stdout.write(`Restored ${q(target.database)} from ${file}:\n  ${tableCounts().join('\n  ')}\n`);
