// npm run db:backup with BACKUP_S3_* set: the archive is copied to an S3-compatible bucket (s3rver, a
// local stand-in, on loopback), the bucket is pruned with the local retention rule, and a bucket that
// cannot be reached leaves the local archive as the backup (exit 0, the failure logged).
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { GetObjectCommand, ListObjectsV2Command, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { freePort } from '../../scripts/lib/scratch.mjs';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { startS3StandIn, S3RVER_KEY as KEY, type S3StandIn } from '../support/s3-stand-in.ts';

const BUCKET = 'scanwright-backups';

let db: PrivateMariaDb;
let s3: S3StandIn;
let endpoint: string;
let client: S3Client;
let work: string;

function backup(env: Record<string, string>) {
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve) => {
    const child = spawn(process.execPath, ['scripts/db-backup.mjs'], {
      env: {
        ...process.env,
        MARIADB_SOCKET: db.socket,
        DB_NAME: db.db.name,
        BACKUP_DIR: join(work, 'backups'),
        UPLOADS_DIR: join(work, 'uploads'),
        AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
        ...env,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (c) => (stdout += c));
    child.stderr.on('data', (c) => (stderr += c));
    child.on('exit', (code) => resolve({ code, stdout, stderr }));
  });
}

const bucketEnv = (prefix: string) => ({
  BACKUP_S3_BUCKET: BUCKET,
  BACKUP_S3_ENDPOINT: endpoint,
  BACKUP_S3_REGION: 'us-east-1',
  BACKUP_S3_ACCESS_KEY_ID: KEY,
  BACKUP_S3_SECRET_ACCESS_KEY: KEY,
  BACKUP_S3_PREFIX: prefix,
});

async function keys(prefix: string) {
  const res = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: prefix }));
  return (res.Contents ?? []).map((o) => o.Key!).sort();
}

const put = (key: string) => client.send(new PutObjectCommand({ Bucket: BUCKET, Key: key, Body: Buffer.from('old archive') }));
const written = (stdout: string) => /Backed up database `[^`]+` .* to (\S+\.tar\.gz)/.exec(stdout)?.[1] ?? '';

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'scanwright-backup-s3-'));
  db = await startPrivateMariaDb({ database: 'scanwright_s3', migrate: true });
  s3 = await startS3StandIn(work, BUCKET);
  endpoint = s3.endpoint;
  client = s3.client;
}, 90_000);

afterAll(async () => {
  await s3?.close();
  await db?.destroy();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('npm run db:backup with an S3-compatible bucket configured', () => {
  test('when a backup is made, then the same archive is in the bucket under the prefix', async () => {
    const res = await backup(bucketEnv('nightly'));
    expect(res.stderr).toBe('');
    expect(res.code).toBe(0);
    const file = written(res.stdout);
    expect(existsSync(file)).toBe(true);
    const key = `nightly/${basename(file)}`;
    expect(res.stdout).toContain(`Backup copied to s3://${BUCKET}/nightly/${basename(file)}`);
    expect(await keys('nightly/')).toEqual([key]);
    const got = await client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }));
    expect(Buffer.from(await got.Body!.transformToByteArray()).equals(readFileSync(file))).toBe(true);
  }, 60_000);

  test('when the bucket holds older archives, then the retention rule prunes them and nothing else', async () => {
    const p = 'pruned/';
    // One scheduled archive a day, 2020-01-01 … 2020-01-20 (a Wednesday … a Monday) [calc: calendar].
    const days = Array.from({ length: 20 }, (_, i) => `2020-01-${String(i + 1).padStart(2, '0')}`);
    for (const d of days) await put(`${p}scanwright_s3-${d}T03-00-00Z.tar.gz`);
    const untouched = [
      `${p}pre-restore-scanwright_s3-2020-01-02T03-00-00Z.tar.gz`, // made before a restore: never pruned
      `${p}otherdb-2020-01-02T03-00-00Z.tar.gz`, // another database
      `${p}notes.txt`, // not an archive
      `${p}deeper/scanwright_s3-2020-01-02T03-00-00Z.tar.gz`, // below the prefix, not at it
      `elsewhere/scanwright_s3-2020-01-02T03-00-00Z.tar.gz`, // outside the prefix
    ];
    for (const k of untouched) await put(k);

    const res = await backup(bucketEnv('pruned'));
    expect(res.code).toBe(0);
    const fresh = `${p}${basename(written(res.stdout))}`;
    // Kept: 7 days = today's new archive + 2020-01-20 … 01-15; 4 ISO weeks = today's week, 2020-W04 (20th),
    // W03 (newest 19th), W02 (newest 12th) [calc: ISO 8601 weeks of January 2020, W02 = 6–12 Jan].
    const keptDays = ['20', '19', '18', '17', '16', '15', '12'].map((d) => `${p}scanwright_s3-2020-01-${d}T03-00-00Z.tar.gz`);
    expect(await keys(p)).toEqual([fresh, ...keptDays, ...untouched.filter((k) => k.startsWith(p))].sort());
    expect(await keys('elsewhere/')).toHaveLength(1);
    expect(res.stdout).toMatch(/Old backups removed from s3:\/\/scanwright-backups\/pruned\/.*scanwright_s3-2020-01-01T03-00-00Z/);
  }, 60_000);

  test('when the bucket cannot be reached, then the local archive is kept, the failure is logged and it exits 0', async () => {
    const closed = await freePort();
    const res = await backup({ ...bucketEnv('x'), BACKUP_S3_ENDPOINT: `http://127.0.0.1:${closed}` });
    expect(res.code).toBe(0);
    const file = written(res.stdout);
    expect(existsSync(file)).toBe(true);
    expect(res.stdout).toMatch(/Copy to s3:\/\/scanwright-backups\/x\/ at http:\/\/127\.0\.0\.1:\d+ failed \(the local archive is kept\)/);
    expect(res.stdout).not.toContain(KEY);
  }, 60_000);
});
