// npm run db:backup / db:restore against a private MariaDB, with the app running on it.
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { expectError } from '../support/expect-error.ts';
import { seedDemoOnce } from '../../server/db/seed/demo.ts';

let db: PrivateMariaDb;
let t: TestApp;
let backups: string;

function script(name: 'db-backup' | 'db-restore', args: string[] = [], env: Record<string, string> = {}) {
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve) => {
    const child = spawn(process.execPath, [`scripts/${name}.mjs`, ...args], {
      env: {
        ...process.env,
        MARIADB_SOCKET: db.socket,
        DB_NAME: db.db.name,
        BACKUP_DIR: backups,
        UPLOADS_DIR: t.config.uploadsDir,
        ...env,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (c) => {
      stdout += c;
    });
    child.stderr.on('data', (c) => {
      stderr += c;
    });
    child.on('exit', (code) => resolve({ code, stdout, stderr }));
  });
}

/** Every row of every table, in key order: what "back exactly" is compared against. */
async function snapshot(): Promise<Record<string, unknown[]>> {
  const tables = (await t.handle.sequelize.query('SHOW FULL TABLES', { type: 'SELECT' })) as Array<Record<string, string>>;
  const out: Record<string, unknown[]> = {};
  for (const row of tables) {
    const [name, kind] = Object.values(row);
    if (kind !== 'BASE TABLE') continue;
    out[name] = await t.handle.sequelize.query(`SELECT * FROM \`${name}\` ORDER BY 1`, { type: 'SELECT' });
  }
  return out;
}

const backupPath = (stdout: string) => /Backed up database `[^`]+` .* to (\S+\.tar\.gz)/.exec(stdout)?.[1] ?? '';

beforeAll(async () => {
  db = await startPrivateMariaDb({ database: 'scanwright_backup' });
  t = await startTestApp({ db: db.db });
  backups = mkdtempSync(join(tmpdir(), 'scanwright-backups-'));
  await seedDemoOnce(t.handle.sequelize);
}, 60_000);

afterAll(async () => {
  await t?.close();
  await db?.destroy();
  if (backups) rmSync(backups, { recursive: true, force: true });
});

describe('npm run db:backup, then npm run db:restore FILE', () => {
  test('when rows are changed and deleted after a backup, then the restore brings every row back exactly', async () => {
    const owner = await createUser();
    const agent = await signIn(t, owner.login);
    const part = await createPart({ proposedById: owner.id });
    const build = await createBuildRow(owner.id, { status: 'published', title: 'Kept by the backup' });
    await createRunRow({ buildId: build.id, partId: part.id, ownerId: owner.id, gainNmPerV: 88, status: 'accepted' });
    const before = await snapshot();
    expect(before.users.length).toBeGreaterThan(5);
    expect(before.calibration_runs.length).toBeGreaterThan(5);

    const made = await script('db-backup');
    expect(made.code).toBe(0);
    const file = backupPath(made.stdout);
    expect(file.startsWith(backups)).toBe(true);
    expect(made.stdout).toMatch(/\(\d+ tables, \d+ rows\)/);
    expect(existsSync(`${file}.partial`)).toBe(false);

    // Change, delete and add after the backup, through the running app and directly.
    await request(t.app).get(`/api/builds/${build.id}`).expect(200);
    await t.handle.sequelize.query(`UPDATE users SET name = 'Renamed after backup' WHERE id = ${owner.id}`);
    await t.handle.sequelize.query(`DELETE FROM calibration_runs WHERE build_id = ${build.id}`);
    await t.handle.sequelize.query(`DELETE FROM builds WHERE id = ${build.id}`);
    await t.handle.sequelize.query('DELETE FROM listings');
    await createPart({ name: 'Added after backup' });
    expectError(await request(t.app).get(`/api/builds/${build.id}`), 404, 'not_found');
    expect(await snapshot()).not.toEqual(before);

    const restored = await script('db-restore', [file, '--yes']);
    expect(restored.stderr).toBe('');
    expect(restored.code).toBe(0);
    expect(restored.stdout).toContain(`This will OVERWRITE database \`${db.db.name}\``);
    expect(restored.stdout).toMatch(/builds \d+/);
    expect(restored.stdout).toMatch(/Saved the current contents first: .*pre-restore-scanwright_backup-.*\.tar\.gz/);

    expect(await snapshot()).toEqual(before);
    // The running app sees the restored rows, and the signed-in session (made before the backup) still works.
    await request(t.app).get(`/api/builds/${build.id}`).expect(200);
    const me = await agent.get('/api/session').expect(200);
    expect(me.body.user).toMatchObject({ login: owner.login, name: owner.login });
  });

  test('when no file is given, then it refuses and lists the backups there are', async () => {
    await script('db-backup');
    const res = await script('db-restore');
    expect(res.code).toBe(2);
    expect(res.stderr).toContain('Refusing to restore without a file');
    expect(res.stderr).toContain(backups);
  });

  test('when not confirmed on a non-interactive input, then it says what it would overwrite and changes nothing', async () => {
    const made = await script('db-backup');
    const part = await createPart({ name: 'Survives a refused restore' });
    const res = await script('db-restore', [backupPath(made.stdout)]);
    expect(res.code).toBe(2);
    expect(res.stdout).toContain('This will OVERWRITE database');
    expect(res.stdout).toMatch(/parts \d+/);
    expect(res.stderr).toContain('add --yes');
    const [rows] = await t.handle.sequelize.query(`SELECT id FROM parts WHERE id = ${part.id}`);
    expect(rows).toHaveLength(1);
  });

  test('when the archive is truncated or the file not a dump, then it refuses before touching the database', async () => {
    const made = await script('db-backup');
    const bytes = readFileSync(backupPath(made.stdout));
    const cut = join(backups, 'cut.tar.gz');
    writeFileSync(cut, bytes.subarray(0, Math.floor(bytes.length / 2)));
    const notDump = join(backups, 'notes.sql');
    writeFileSync(notDump, 'DROP TABLE users;\n');
    const before = await snapshot();
    const a = await script('db-restore', [cut, '--yes']);
    expect([a.code, a.stderr]).toEqual([1, expect.stringContaining('cannot be read as a backup archive')]);
    const b = await script('db-restore', [notDump, '--yes']);
    expect([b.code, b.stderr]).toEqual([1, expect.stringContaining('does not look like a mariadb-dump file')]);
    const c = await script('db-restore', [join(backups, 'missing.sql'), '--yes']);
    expect([c.code, c.stderr]).toEqual([1, expect.stringContaining('No such backup file')]);
    expect(await snapshot()).toEqual(before);
  });

  test('when MariaDB is not running, then both say so clearly and write nothing', async () => {
    const elsewhere = { MARIADB_SOCKET: join(backups, 'no-server', 'mysqld.sock') };
    const filesBefore = readdirSync(backups);
    const b = await script('db-backup', [], elsewhere);
    expect(b.code).toBe(1);
    expect(b.stderr).toContain('MariaDB is not running');
    expect(b.stderr).toContain('npm start');
    const made = await script('db-backup');
    const r = await script('db-restore', [backupPath(made.stdout), '--yes'], elsewhere);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('MariaDB is not running');
    // Only the backup made while the server was up was added (it may replace one made in the same second).
    const made1 = backupPath(made.stdout).split('/').pop()!;
    // (Scheduled archives of the same day are pruned to the newest: 7 daily and 4 weekly are kept.)
    expect(readdirSync(backups).filter((f) => !filesBefore.includes(f))).toEqual([made1]);
  });
});
