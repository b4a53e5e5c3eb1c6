// The steps of `npm run db:restore` that touch the live database, in order:
//   fence         a `maintenance` row in app_meta: the app (server/middleware/maintenance.ts) answers writes
//                 503 within a second; then wait until no transaction of the app is open.
//   holdOutbox    claim every unsent mail for the restore (the outbox's own lease columns) once no worker holds
//                 it, so which mails were sent is final while the restored copy is prepared.
//   carryOver     in the restored copy, mark sent what the live outbox has sent since the backup (same id,
//                 recipient, subject and creation time), so no mail goes out twice.
//   switchTables  one RENAME TABLE statement moves every live table to `<db>_old_<time>` and every restored
//                 one into its place: atomic, so readers see the old rows or the new ones, never a missing table.
import { spawnSync } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import { rootArgs } from './backup-archive.mjs';

export const q = (name) => `\`${name.replace(/`/g, '``')}\``;
const lit = (s) => `'${String(s).replace(/\\/g, '\\\\').replace(/'/g, "''")}'`;
const RESTORE_CLAIM = 'db-restore';

/** SQL as root over the socket; rows as arrays of strings (tab-separated batch output). */
export function sqlRows(socket, statement, database = '') {
  const r = spawnSync(
    'mariadb',
    [...rootArgs(socket), '--batch', '--skip-column-names', '-e', statement, ...(database ? [database] : [])],
    {
      encoding: 'utf8',
      maxBuffer: 64 * 1024 * 1024,
    },
  );
  if (r.status !== 0) throw new Error(`MariaDB refused: ${r.stderr.trim()}`);
  return r.stdout
    .split('\n')
    .filter(Boolean)
    .map((l) => l.split('\t'));
}

export function baseTables(socket, database) {
  return sqlRows(
    socket,
    `SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA = ${lit(database)} AND TABLE_TYPE = 'BASE TABLE' ORDER BY 1`,
  ).map(([t]) => t);
}

/** Set the maintenance flag; false when the database has no app_meta table (nothing runs on it). */
export function fence(socket, database, reason) {
  if (!baseTables(socket, database).includes('app_meta')) return false;
  const value = JSON.stringify({ reason, since: new Date().toISOString() });
  sqlRows(
    socket,
    `REPLACE INTO app_meta (meta_key, meta_value, created_at, updated_at) VALUES ('maintenance', ${lit(value)}, NOW(), NOW())`,
    database,
  );
  return true;
}

export function unfence(socket, database) {
  if (baseTables(socket, database).includes('app_meta')) sqlRows(socket, "DELETE FROM app_meta WHERE meta_key = 'maintenance'", database);
}

/**
 * After the flag: the app reads it within a second (plus one query), then writes already past the check
 * finish. Waits for that second and a half, then until no other connection to `database` holds an open
 * transaction on three looks in a row (at most `maxMs`). Resolves with the ms waited.
 */
export async function settleFence(socket, database, maxMs = 20_000) {
  const started = Date.now();
  await sleep(1500);
  let quiet = 0;
  while (quiet < 3 && Date.now() - started < maxMs) {
    const [[open]] = sqlRows(
      socket,
      `SELECT COUNT(*) FROM information_schema.INNODB_TRX t JOIN information_schema.PROCESSLIST p ON p.ID = t.trx_mysql_thread_id
        WHERE p.DB = ${lit(database)} AND p.ID <> CONNECTION_ID()`,
    );
    quiet = Number(open) === 0 ? quiet + 1 : 0;
    await sleep(100);
  }
  return Date.now() - started;
}

/**
 * Claim every unsent mail of the live outbox for the restore, waiting (at most `maxMs`) for mails a worker
 * has in the relay's hands to finish: their sent_at is then recorded and final. Resolves with how many
 * unsent mails were still held by a worker when the wait ended (0 normally).
 */
export async function holdOutbox(socket, database, maxMs = 45_000) {
  if (!baseTables(socket, database).includes('mail_outbox')) return 0;
  const started = Date.now();
  for (;;) {
    sqlRows(
      socket,
      `UPDATE mail_outbox SET claimed_by = '${RESTORE_CLAIM}', claimed_until = NOW() + INTERVAL 1 HOUR
        WHERE sent_at IS NULL AND (claimed_until IS NULL OR claimed_until < NOW() OR claimed_by = '${RESTORE_CLAIM}')`,
      database,
    );
    const [[held]] = sqlRows(
      socket,
      `SELECT COUNT(*) FROM mail_outbox WHERE sent_at IS NULL AND claimed_by <> '${RESTORE_CLAIM}' AND claimed_until >= NOW()`,
      database,
    );
    if (Number(held) === 0 || Date.now() - started > maxMs) return Number(held);
    await sleep(200);
  }
}

/** Give the live outbox back (a restore that stopped before the switch). */
export function releaseOutbox(socket, database) {
  if (!baseTables(socket, database).includes('mail_outbox')) return;
  sqlRows(socket, `UPDATE mail_outbox SET claimed_by = NULL, claimed_until = NULL WHERE claimed_by = '${RESTORE_CLAIM}'`, database);
}

/**
 * In the restored copy: mails the live outbox has sent since the backup are marked sent (matched by id,
 * recipient, subject and creation time); every claim from the backup's moment is cleared. Returns how many
 * were marked.
 */
export function carryOverOutbox(socket, live, restored) {
  const has = (db) => baseTables(socket, db).includes('mail_outbox');
  if (!has(restored)) return 0;
  let marked = 0;
  if (has(live)) {
    const [[n]] = sqlRows(
      socket,
      `UPDATE ${q(restored)}.mail_outbox r JOIN ${q(live)}.mail_outbox l
          ON l.id = r.id AND l.to_address = r.to_address AND l.subject = r.subject AND l.created_at = r.created_at
          SET r.sent_at = l.sent_at, r.attempts = GREATEST(r.attempts, l.attempts), r.last_error = l.last_error
        WHERE r.sent_at IS NULL AND l.sent_at IS NOT NULL;
       SELECT ROW_COUNT();`,
    );
    marked = Number(n);
  }
  sqlRows(socket, `UPDATE ${q(restored)}.mail_outbox SET claimed_by = NULL, claimed_until = NULL WHERE claimed_by IS NOT NULL`);
  return marked;
}

/** Copy the maintenance row into the restored copy, so the fence holds across the switch. */
export function carryFence(socket, live, restored) {
  if (!baseTables(socket, restored).includes('app_meta') || !baseTables(socket, live).includes('app_meta')) return;
  sqlRows(socket, `REPLACE INTO ${q(restored)}.app_meta SELECT * FROM ${q(live)}.app_meta WHERE meta_key = 'maintenance'`);
}

/**
 * One RENAME TABLE: live tables that the restored copy also has go to `old`, the restored ones take their
 * names (tables only the live side has stay where they are). Resolves with the ms the statement took.
 */
export function switchTables(socket, live, restored, old) {
  const liveTables = new Set(baseTables(socket, live));
  const moves = [];
  for (const t of baseTables(socket, restored)) {
    if (liveTables.has(t)) moves.push(`${q(live)}.${q(t)} TO ${q(old)}.${q(t)}`);
    moves.push(`${q(restored)}.${q(t)} TO ${q(live)}.${q(t)}`);
  }
  sqlRows(socket, `CREATE DATABASE IF NOT EXISTS ${q(old)}`);
  const started = Date.now();
  sqlRows(socket, `RENAME TABLE ${moves.join(', ')}`);
  return Date.now() - started;
}

/** Rows per base table of `database`, as "name count" lines. */
export function tableCounts(socket, database) {
  const tables = baseTables(socket, database);
  if (!tables.length) return [];
  return sqlRows(socket, tables.map((t) => `SELECT ${lit(t)}, COUNT(*) FROM ${q(database)}.${q(t)}`).join(' UNION ALL ')).map(
    ([t, n]) => `${t} ${n}`,
  );
}
