// `npm run db:restore FILE [--yes] [--keep-old]`: put the app's database and uploads back to a backup made
// by db:backup (an archive; a plain .sql dump of older versions works too), on the private MariaDB that
// `npm start` runs, while the app keeps running:
//   1. check the archive against its manifest (nothing changes when it does not match);
//   2. say what will be overwritten and ask (or take --yes);
//   3. fence: writes answer 503 `maintenance` (Retry-After), reads go on from the current data;
//   4. save the current contents as a pre-restore archive;
//   5. load the dump into `<db>_restore`, apply newer migrations there, add missing upload files;
//   6. carry over which mails were sent since the backup, so none goes out twice;
//   7. switch with one RENAME TABLE (readers never see a missing table), lift the fence.
// The steps against the live database are in scripts/lib/restore-switch.mjs.
import { spawn } from 'node:child_process';
import { closeSync, copyFileSync, existsSync, mkdirSync, mkdtempSync, openSync, readdirSync, readSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { createInterface } from 'node:readline/promises';
import { dbTarget, fail, requireRunningServer } from './db-backup.mjs';
import { checkExtracted, createBackup, extractArchive, listFiles, rootArgs, stamp } from './lib/backup-archive.mjs';
import { localSecrets } from './lib/paths.mjs';
import {
  carryFence,
  carryOverOutbox,
  fence,
  holdOutbox,
  q,
  releaseOutbox,
  settleFence,
  sqlRows,
  switchTables,
  tableCounts,
  unfence,
} from './lib/restore-switch.mjs';
import { buildServer } from './build-server.mjs';
import { serverBuildIsStale } from './lib/paths.mjs';

const args = process.argv.slice(2);
const yes = args.includes('--yes') || args.includes('-y') || process.env.npm_config_yes === 'true';
const keepOld = args.includes('--keep-old');
const fileArg = args.find((a) => !a.startsWith('-'));
const target = dbTarget();
const say = (line) => process.stdout.write(`${line}\n`);

if (!fileArg) {
  let listing = '';
  if (existsSync(target.backupDir)) {
    const files = readdirSync(target.backupDir)
      .filter((f) => f.endsWith('.tar.gz') || f.endsWith('.sql'))
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
const work = mkdtempSync(join(tmpdir(), 'scanwright-restore-'));
process.on('exit', () => rmSync(work, { recursive: true, force: true }));

let dump = file;
let manifest = null;
if (file.endsWith('.tar.gz')) {
  try {
    manifest = await extractArchive(file, work);
  } catch (err) {
    fail(`${file} cannot be read as a backup archive (${err instanceof Error ? err.message.split('\n')[0] : err}); nothing was changed.`);
  }
  const problems = await checkExtracted(work, manifest);
  if (problems.length) fail(`${file} does not match its manifest; nothing was changed:\n  ${problems.join('\n  ')}`);
  dump = join(work, manifest.dump.file);
}
// A dump from mariadb-dump opens with its banner (after the sandbox-mode line of newer versions)
// and, when complete, ends with "-- Dump completed".
const head = Buffer.alloc(300);
const tail = Buffer.alloc(200);
const fd = openSync(dump, 'r');
readSync(fd, head, 0, head.length, 0);
readSync(fd, tail, 0, tail.length, Math.max(0, statSync(dump).size - tail.length));
closeSync(fd);
if (!/^(\/\*M!999999\\- enable the sandbox mode \*\/ *\n)?-- (MariaDB|MySQL) dump/.test(head.toString('utf8')))
  fail(`${file} does not look like a mariadb-dump file; nothing was changed.`);
if (!tail.toString('utf8').includes('-- Dump completed'))
  fail(`${file} is incomplete (no "-- Dump completed" at the end); nothing was changed.`);

const { socket, database } = target;
const exists = requireRunningServer(target);
const current = exists ? tableCounts(socket, database) : [];
say(
  `This will OVERWRITE database ${q(database)} on ${socket}\n` +
    `with the backup ${file} (${(statSync(file).size / 1024).toFixed(1)} KiB${manifest ? `, made ${manifest.createdAt}` : ''}).\n` +
    (current.length
      ? `Everything in it now is replaced (table rows):\n  ${current.join('\n  ')}\n`
      : 'The database is empty or missing now.\n') +
    'Changes made after the backup are lost (they are saved in a pre-restore archive first). While it runs, the app\n' +
    'keeps answering reads from the current data and refuses changes with 503 "maintenance"; nothing is half-replaced.',
);

if (!yes) {
  if (!process.stdin.isTTY) fail('Not asking on a non-interactive input: add --yes to confirm.', 2);
  const rl = createInterface({ input: process.stdin, output: process.stdout });
  const answer = await rl.question(`Type the database name (${database}) to continue: `);
  rl.close();
  if (answer.trim() !== database) fail('Nothing was changed.', 1);
}

/** Load the dump into `db` (created empty first). */
async function load(db) {
  sqlRows(socket, `DROP DATABASE IF EXISTS ${q(db)}; CREATE DATABASE ${q(db)} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const code = await new Promise((done) => {
    const input = openSync(dump, 'r');
    const child = spawn('mariadb', [...rootArgs(socket), '--binary-mode', db], { stdio: [input, 'inherit', 'inherit'] });
    child.on('error', () => done(-1));
    child.on('exit', (c) => {
      closeSync(input);
      done(c ?? 1);
    });
  });
  if (code !== 0) throw new Error(`loading ${file} failed (exit ${code})`);
}

/** Apply migrations the backup predates to the restored copy, as the app's user (DB_USER, DB_PASSWORD or .data/secrets.json). */
async function migrate(db) {
  const applied = (d) => {
    try {
      return new Set(sqlRows(socket, 'SELECT name FROM schema_migrations', d).map(([n]) => n));
    } catch {
      return new Set();
    }
  };
  const missing = [...applied(database)].filter((n) => !applied(db).has(n));
  if (!missing.length) return 0;
  const user = process.env.DB_USER ?? 'scanwright';
  const password = process.env.DB_PASSWORD ?? localSecrets().dbPassword;
  sqlRows(socket, `GRANT ALL PRIVILEGES ON ${q(db)}.* TO '${user}'@'127.0.0.1'`);
  const [[port]] = sqlRows(socket, 'SELECT @@port');
  if (serverBuildIsStale()) await buildServer();
  const env = { ...process.env, DB_HOST: '127.0.0.1', DB_PORT: port, DB_NAME: db, DB_USER: user, DB_PASSWORD: password };
  const code = await new Promise((done) => {
    const child = spawn(process.execPath, ['dist/server/migrate.mjs'], { env, stdio: 'inherit' });
    child.on('exit', (c) => done(c ?? 1));
  });
  if (code !== 0) throw new Error(`migrating the restored copy failed (exit ${code})`);
  return missing.length;
}

/** Upload files of the archive that are missing on disk (names are content hashes: same name, same bytes). */
function addUploads() {
  const from = join(work, 'uploads');
  let added = 0;
  for (const name of listFiles(from)) {
    const to = join(target.uploadsDir, name);
    if (existsSync(to)) continue;
    mkdirSync(dirname(to), { recursive: true });
    copyFileSync(join(from, name), to);
    added++;
  }
  return added;
}

const restoreDb = `${database}_restore`;
const oldDb = `${database}_old_${stamp().replace(/-/g, '').toLowerCase()}`;
const t0 = Date.now();
let fenced = false;
let switched = false;
try {
  if (exists) {
    fenced = fence(socket, database, `restore of ${file}`);
    if (fenced) {
      say('Writes are paused (maintenance) …');
      say(`Waited ${await settleFence(socket, database)} ms for the app to see it and for writes in flight to finish.`);
    }
  }
  if (exists && current.length) {
    const { file: saved } = await createBackup(target, 'pre-restore-');
    say(`Saved the current contents first: ${saved}`);
  }
  await load(restoreDb);
  const migrated = exists ? await migrate(restoreDb) : 0;
  if (migrated) say(`Applied ${migrated} migration(s) the backup predates.`);
  if (manifest) {
    const added = addUploads();
    if (added) say(`Added ${added} upload file(s) from the archive.`);
  }
  if (exists) {
    const held = await holdOutbox(socket, database);
    if (held) say(`Warning: ${held} mail(s) were still being sent by the app; they may be sent again.`);
    const marked = carryOverOutbox(socket, database, restoreDb);
    if (marked) say(`Marked ${marked} mail(s) as sent that went out after the backup.`);
    carryFence(socket, database, restoreDb);
  } else sqlRows(socket, `CREATE DATABASE IF NOT EXISTS ${q(database)} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const ms = switchTables(socket, database, restoreDb, oldDb);
  switched = true;
  say(`Switched to the restored tables in one statement (${ms} ms).`);
} catch (err) {
  if (!switched && exists) releaseOutbox(socket, database);
  if (fenced) unfence(socket, database);
  sqlRows(socket, `DROP DATABASE IF EXISTS ${q(restoreDb)}`);
  fail(
    `Restore stopped: ${err instanceof Error ? err.message : err}\nThe database was not changed${fenced ? ' and writes are open again' : ''}.`,
  );
}
unfence(socket, database);
say('Writes are open again.');
sqlRows(socket, `DROP DATABASE IF EXISTS ${q(restoreDb)}`);
if (!keepOld) sqlRows(socket, `DROP DATABASE IF EXISTS ${q(oldDb)}`);
say(
  `Restored ${q(database)} from ${file} in ${((Date.now() - t0) / 1000).toFixed(1)} s${keepOld ? ` (the replaced tables are in ${q(oldDb)})` : ''}:\n  ` +
    tableCounts(socket, database).join('\n  '),
);
