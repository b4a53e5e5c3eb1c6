// `npm run db:verify [FILE]`: prove a backup archive restores. Unpacks the newest archive in the backup
// directory (or FILE), checks the dump's and every upload's sha256 against the manifest, loads the dump
// into a throwaway MariaDB (own data directory and port, VERIFY_PORT to choose it), counts the rows of
// every table and compares them and the migration list with the manifest. Prints OK, or what differs
// and exits 1. Never touches the running database.
import { spawn } from 'node:child_process';
import { closeSync, existsSync, mkdtempSync, openSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { checkExtracted, extractArchive, listArchives, rootArgs } from './lib/backup-archive.mjs';
import { backupDir } from './lib/backup-schedule.mjs';
import { startThrowawayMariaDb } from './lib/throwaway-mariadb.mjs';

const say = (line) => process.stdout.write(`${line}\n`);
const arg = process.argv.slice(2).find((a) => !a.startsWith('-'));
const dir = backupDir();
const file = arg ? resolve(arg) : listArchives(dir).find((a) => a.prefix === '')?.file;
if (!file || !existsSync(file)) {
  process.stderr.write(arg ? `No such backup file: ${file}\n` : `No backup archive in ${dir} (make one with npm run db:backup).\n`);
  process.exit(2);
}

const work = mkdtempSync(join(tmpdir(), 'scanwright-verify-'));
let db = null;
const problems = [];
try {
  say(`Verifying ${file} …`);
  const manifest = await extractArchive(file, work);
  problems.push(...(await checkExtracted(work, manifest)));
  const started = Date.now();
  db = await startThrowawayMariaDb({ port: process.env.VERIFY_PORT ? Number(process.env.VERIFY_PORT) : undefined });
  const name = manifest.database;
  db.sql(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const loaded = await new Promise((done) => {
    const input = openSync(join(work, 'database.sql'), 'r');
    const child = spawn('mariadb', [...rootArgs(db.socket), '--binary-mode', name], { stdio: [input, 'ignore', 'pipe'] });
    let err = '';
    child.stderr.on('data', (c) => (err += c));
    child.on('close', (code) => {
      closeSync(input);
      done(code === 0 ? '' : err.trim() || `exit ${code}`);
    });
  });
  if (loaded) problems.push(`the dump does not load: ${loaded}`);
  else {
    const tables = db
      .sql(`SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA = '${name}' AND TABLE_TYPE = 'BASE TABLE' ORDER BY 1`)
      .split('\n')
      .filter(Boolean)
      .slice(1);
    const counts = tables.length
      ? db
          .sql(tables.map((t) => `SELECT '${t}', COUNT(*) FROM \`${name}\`.\`${t}\``).join(' UNION ALL '))
          .split('\n')
          .filter(Boolean)
          .slice(1)
          .map((l) => l.split('\t'))
      : [];
    const got = Object.fromEntries(counts.map(([t, n]) => [t, Number(n)]));
    for (const [t, want] of Object.entries(manifest.tables)) {
      if (!(t in got)) problems.push(`table ${t}: missing after restore (manifest: ${want} rows)`);
      else if (got[t] !== want) problems.push(`table ${t}: ${got[t]} rows after restore, manifest says ${want}`);
    }
    for (const t of Object.keys(got)) if (!(t in manifest.tables)) problems.push(`table ${t}: not in the manifest`);
    if ('schema_migrations' in got) {
      const applied = db.sql(`SELECT name FROM \`${name}\`.schema_migrations ORDER BY name`).split('\n').filter(Boolean).slice(1);
      if (JSON.stringify(applied) !== JSON.stringify(manifest.migrations))
        problems.push(`migrations differ: restored ${applied.length}, manifest lists ${manifest.migrations.length}`);
    }
    say(
      `Restored into a throwaway MariaDB in ${((Date.now() - started) / 1000).toFixed(1)} s: ${Object.keys(got).length} tables, ` +
        `${Object.values(got).reduce((a, b) => a + b, 0)} rows; ${Object.keys(manifest.uploads).length} upload files checked.`,
    );
  }
  say(
    `Backup made ${manifest.createdAt} by ${manifest.app.name} ${manifest.app.version}${manifest.app.commit ? ` (${manifest.app.commit})` : ''}.`,
  );
} catch (err) {
  problems.push(err instanceof Error ? err.message : String(err));
} finally {
  await db?.destroy();
  rmSync(work, { recursive: true, force: true });
}
if (problems.length) {
  say(`NOT OK: ${file}\n${problems.map((p) => `  - ${p}`).join('\n')}`);
  process.exit(1);
}
say(`OK: ${file}`);
