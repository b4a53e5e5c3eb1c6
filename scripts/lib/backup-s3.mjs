// Optional off-site copy of each backup archive to an S3-compatible bucket. Set BACKUP_S3_BUCKET (and
// BACKUP_S3_ENDPOINT for anything but AWS, BACKUP_S3_REGION, BACKUP_S3_ACCESS_KEY_ID,
// BACKUP_S3_SECRET_ACCESS_KEY, optionally BACKUP_S3_PREFIX) and every archive that `npm run db:backup` or
// the schedule in `npm start` writes is uploaded (PutObject) as <prefix><archive name>; then the bucket's
// scheduled archives under the prefix are pruned with the same retention as the local ones
// (ListObjectsV2 + DeleteObjects). A failed upload or prune is logged and changes nothing locally: the
// local archive is the backup, the bucket is a copy.
import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { ARCHIVE_RE } from './backup-archive.mjs';

/** The bucket settings from the environment, or null when no bucket is configured. */
export function s3Settings(env = process.env) {
  const bucket = env.BACKUP_S3_BUCKET?.trim();
  if (!bucket) return null;
  const raw = (env.BACKUP_S3_PREFIX ?? '').trim().replace(/^\/+/, '');
  return {
    bucket,
    prefix: raw && !raw.endsWith('/') ? `${raw}/` : raw,
    endpoint: env.BACKUP_S3_ENDPOINT?.trim() || undefined,
    region: env.BACKUP_S3_REGION?.trim() || 'us-east-1',
    accessKeyId: env.BACKUP_S3_ACCESS_KEY_ID,
    secretAccessKey: env.BACKUP_S3_SECRET_ACCESS_KEY,
  };
}

/** Where the bucket (or one key in it) is, for log lines (no credentials). */
export const describeBucket = (s, name = '') => `s3://${s.bucket}/${s.prefix}${name}${s.endpoint ? ` at ${s.endpoint}` : ''}`;

async function client(s) {
  // Loaded only when a bucket is configured: the SDK is large and most installs do not use it.
  const sdk = await import('@aws-sdk/client-s3');
  const c = new sdk.S3Client({
    region: s.region,
    endpoint: s.endpoint,
    // Custom endpoints (MinIO, Garage, Ceph, …) usually want bucket-in-path, not bucket-in-hostname.
    forcePathStyle: Boolean(s.endpoint),
    credentials: s.accessKeyId && s.secretAccessKey ? { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey } : undefined,
    maxAttempts: 3,
  });
  return { c, sdk };
}

/** Archive objects of `database` under the prefix, newest first (`{ key, name, prefix, at }`). */
async function listBucketArchives({ c, sdk }, s, database) {
  const out = [];
  let token;
  do {
    const page = await c.send(new sdk.ListObjectsV2Command({ Bucket: s.bucket, Prefix: s.prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) {
      const name = o.Key.slice(s.prefix.length);
      const m = ARCHIVE_RE.exec(name);
      if (!m || name.includes('/') || m.groups.database !== database) continue;
      out.push({
        key: o.Key,
        name,
        prefix: m.groups.prefix,
        at: new Date(m.groups.stamp.replace(/T(\d\d)-(\d\d)-(\d\d)Z$/, 'T$1:$2:$3Z')),
      });
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return out.sort((a, b) => b.at - a.at);
}

/**
 * Upload `file` and prune the bucket with `keep` (scheduled archives newest first → names to keep).
 * Never throws: returns `{ uploaded: key | null, removed: keys[], error?: string }` and logs what happened.
 */
export async function copyToBucket({ file, database, keep, log, settings = s3Settings() }) {
  if (!settings) return { uploaded: null, removed: [] };
  const where = describeBucket(settings);
  const key = `${settings.prefix}${basename(file)}`;
  let s3;
  try {
    s3 = await client(settings);
    await s3.c.send(
      new s3.sdk.PutObjectCommand({ Bucket: settings.bucket, Key: key, Body: await readFile(file), ContentType: 'application/gzip' }),
    );
  } catch (err) {
    const error = err instanceof Error ? `${err.name}: ${err.message}` : String(err);
    log(`Copy to ${where} failed (the local archive is kept): ${error}`);
    s3?.c.destroy();
    return { uploaded: null, removed: [], error };
  }
  log(`Backup copied to ${describeBucket(settings, basename(file))}`);
  try {
    const scheduled = (await listBucketArchives(s3, settings, database)).filter((a) => a.prefix === '');
    const kept = keep(scheduled);
    const removed = scheduled.filter((a) => !kept.has(a.name)).map((a) => a.key);
    // DeleteObjects takes at most 1000 keys a call.
    for (let i = 0; i < removed.length; i += 1000) {
      const res = await s3.c.send(
        new s3.sdk.DeleteObjectsCommand({
          Bucket: settings.bucket,
          Delete: { Objects: removed.slice(i, i + 1000).map((Key) => ({ Key })), Quiet: true },
        }),
      );
      if (res.Errors?.length) throw new Error(res.Errors.map((e) => `${e.Key}: ${e.Code}`).join(', '));
    }
    if (removed.length) log(`Old backups removed from ${where}: ${removed.join(', ')}`);
    return { uploaded: key, removed };
  } catch (err) {
    const error = err instanceof Error ? `${err.name}: ${err.message}` : String(err);
    log(`Pruning ${where} failed (will try after the next backup): ${error}`);
    return { uploaded: key, removed: [], error };
  } finally {
    s3.c.destroy();
  }
}
