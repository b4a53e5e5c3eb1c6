// The backup schedule inside `npm start`: every BACKUP_INTERVAL_H hours (24 by default, 0 = off) an
// archive (backup-archive.mjs) is made once the newest one is that old, then old archives are pruned:
// the newest of each of the last 7 days and of each of the last 4 ISO weeks are kept. Archives made
// before a restore (prefix `pre-restore-`) are never pruned. BACKUP_DIR moves the archives. With
// BACKUP_S3_BUCKET set each archive is also copied to that bucket and pruned there (backup-s3.mjs).
import { rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { DATA_DIR } from './paths.mjs';
import { createBackup, listArchives } from './backup-archive.mjs';
import { copyToBucket, describeBucket, s3Settings } from './backup-s3.mjs';

export const RETENTION = { daily: 7, weekly: 4 };

export const backupDir = () => resolve(process.env.BACKUP_DIR ?? join(DATA_DIR, 'backups'));

/** ISO 8601 week of a UTC date, as "2026-W49". */
function isoWeek(d) {
  const t = new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
  const day = t.getUTCDay() || 7;
  t.setUTCDate(t.getUTCDate() + 4 - day);
  const yearStart = new Date(Date.UTC(t.getUTCFullYear(), 0, 1));
  return `${t.getUTCFullYear()}-W${String(Math.ceil(((t - yearStart) / 86_400_000 + 1) / 7)).padStart(2, '0')}`;
}

/**
 * Which scheduled archives to keep (newest first in, names out): the newest of each of the `daily` most
 * recent days that have one, and the newest of each of the `weekly` most recent ISO weeks that have one.
 */
export function archivesToKeep(archives, { daily, weekly } = RETENTION) {
  const keep = new Set();
  const pick = (keyOf, n) => {
    const seen = new Set();
    for (const a of archives) {
      const key = keyOf(a.at);
      if (seen.has(key)) continue;
      if (seen.size >= n) break;
      seen.add(key);
      keep.add(a.name);
    }
  };
  pick((d) => d.toISOString().slice(0, 10), daily);
  pick(isoWeek, weekly);
  return keep;
}

/** Delete scheduled archives of `database` that the retention rule does not keep; returns their names. */
export function pruneArchives(dir, database) {
  const scheduled = listArchives(dir).filter((a) => a.prefix === '' && a.database === database);
  const keep = archivesToKeep(scheduled);
  const removed = scheduled.filter((a) => !keep.has(a.name));
  for (const a of removed) rmSync(a.file, { force: true });
  return removed.map((a) => a.name);
}

/** Start the schedule; `stop()` ends it (a backup in progress finishes on its own). */
export function startBackupSchedule({ socket, database, uploadsDir, log }) {
  const hours = Number(process.env.BACKUP_INTERVAL_H ?? 24);
  if (!(hours > 0)) {
    log('Scheduled backups are off (BACKUP_INTERVAL_H=0).');
    return { stop() {} };
  }
  const dir = backupDir();
  const intervalMs = hours * 3600_000;
  let busy = false;
  const check = async () => {
    if (busy) return;
    const newest = listArchives(dir).find((a) => a.prefix === '' && a.database === database);
    if (newest && Date.now() - newest.at.getTime() < intervalMs) return;
    busy = true;
    try {
      const { file } = await createBackup({ socket, database, backupDir: dir, uploadsDir });
      log(`Backup written: ${file}`);
      const removed = pruneArchives(dir, database);
      if (removed.length) log(`Old backups removed (keeping ${RETENTION.daily} daily, ${RETENTION.weekly} weekly): ${removed.join(', ')}`);
      await copyToBucket({ file, database, keep: archivesToKeep, log });
    } catch (err) {
      log(`Backup failed (will try again): ${err instanceof Error ? err.message : err}`);
    } finally {
      busy = false;
    }
  };
  // First look a minute after start (not during it), then every ten minutes or each interval if shorter.
  const first = setTimeout(check, Number(process.env.BACKUP_FIRST_CHECK_S ?? 60) * 1000);
  const timer = setInterval(check, Math.min(intervalMs, 600_000));
  const bucket = s3Settings();
  log(
    `Backups every ${hours} h into ${dir}${bucket ? `, copied to ${describeBucket(bucket)}` : ''} ` +
      `(kept: ${RETENTION.daily} daily, ${RETENTION.weekly} weekly).`,
  );
  return {
    stop() {
      clearTimeout(first);
      clearInterval(timer);
    },
  };
}
