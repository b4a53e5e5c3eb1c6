// Photo files in an S3-compatible bucket (AWS S3, MinIO, Garage, Ceph, or s3rver on loopback), so every app
// instance of a cluster reads and writes the same files. Served by streaming the object through the app with the
// same cache headers as the local folder (no redirect: the bucket need not be reachable from browsers).
import type { Readable } from 'node:stream';
import type { S3Client } from '@aws-sdk/client-s3';
import type { RequestHandler } from 'express';
import { NotFoundError } from '../errors.ts';
import type { Config } from '../config.ts';
import { isStoredName, PHOTO_CACHE_CONTROL, type PhotoStore, type StoreCheck } from './photo-store.ts';

type Sdk = typeof import('@aws-sdk/client-s3');
type S3Settings = NonNullable<Config['s3']>;

const statusOf = (err: unknown) => (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
const isNotFound = (err: unknown) => {
  const name = (err as { name?: string }).name;
  return name === 'NoSuchKey' || name === 'NotFound' || statusOf(err) === 404;
};

export async function createS3PhotoStore(settings: S3Settings): Promise<PhotoStore> {
  const sdk = await import('@aws-sdk/client-s3');
  const client = new sdk.S3Client({
    region: settings.region,
    endpoint: settings.endpoint ?? undefined,
    // Custom endpoints (s3rver, MinIO, …) want bucket-in-path, not bucket-in-hostname.
    forcePathStyle: Boolean(settings.endpoint),
    credentials:
      settings.accessKeyId && settings.secretAccessKey
        ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
        : undefined,
    maxAttempts: 3,
  });
  return new S3PhotoStore(sdk, client, settings.bucket, settings.prefix);
}

class S3PhotoStore implements PhotoStore {
  readonly kind = 's3';
  constructor(
    private readonly sdk: Sdk,
    private readonly client: S3Client,
    private readonly bucket: string,
    private readonly prefix: string,
  ) {}

  private key(name: string) {
    return `${this.prefix}${name}`;
  }

  private async exists(name: string): Promise<boolean> {
    try {
      await this.client.send(new this.sdk.HeadObjectCommand({ Bucket: this.bucket, Key: this.key(name) }));
      return true;
    } catch (err) {
      if (isNotFound(err)) return false;
      throw err;
    }
  }

  async putMissing(files: ReadonlyMap<string, Buffer>): Promise<string[]> {
    const created: string[] = [];
    try {
      for (const [name, bytes] of files) {
        if (await this.exists(name)) continue;
        // A PUT is atomic: readers see the whole object or none. Two instances writing the same name write the same bytes.
        await this.client.send(
          new this.sdk.PutObjectCommand({
            Bucket: this.bucket,
            Key: this.key(name),
            Body: bytes,
            ContentType: 'image/webp',
            CacheControl: PHOTO_CACHE_CONTROL,
          }),
        );
        created.push(name);
      }
    } catch (err) {
      await this.remove(created).catch(() => undefined);
      throw err;
    }
    return created;
  }

  async read(name: string): Promise<Buffer | null> {
    if (!isStoredName(name)) return null;
    try {
      const res = await this.client.send(new this.sdk.GetObjectCommand({ Bucket: this.bucket, Key: this.key(name) }));
      return Buffer.from(await res.Body!.transformToByteArray());
    } catch (err) {
      if (isNotFound(err)) return null;
      throw err;
    }
  }

  async remove(names: Iterable<string>): Promise<void> {
    for (const name of new Set(names)) {
      if (!isStoredName(name)) continue;
      // DeleteObject of a missing key succeeds (S3 semantics), like unlink of a missing file here.
      await this.client.send(new this.sdk.DeleteObjectCommand({ Bucket: this.bucket, Key: this.key(name) }));
    }
  }

  handler(): RequestHandler {
    return async (req, res, next) => {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      const name = req.path.slice(1);
      if (!isStoredName(name)) return next(new NotFoundError('Not found.'));
      try {
        const object = await this.client.send(
          new this.sdk.GetObjectCommand({
            Bucket: this.bucket,
            Key: this.key(name),
            IfNoneMatch: req.get('if-none-match') ?? undefined,
          }),
        );
        res.set({
          'Content-Type': 'image/webp',
          'Cache-Control': PHOTO_CACHE_CONTROL,
          ...(object.ContentLength !== undefined ? { 'Content-Length': String(object.ContentLength) } : {}),
          ...(object.ETag ? { ETag: object.ETag } : {}),
          ...(object.LastModified ? { 'Last-Modified': object.LastModified.toUTCString() } : {}),
        });
        const body = object.Body as Readable;
        if (req.method === 'HEAD') {
          body.destroy();
          return void res.end();
        }
        body.on('error', (err) => next(err));
        body.pipe(res);
      } catch (err) {
        if (statusOf(err) === 304) return void res.status(304).set('Cache-Control', PHOTO_CACHE_CONTROL).end();
        next(isNotFound(err) ? new NotFoundError('Not found.') : err);
      }
    };
  }

  async check(): Promise<StoreCheck> {
    await this.client.send(new this.sdk.HeadBucketCommand({ Bucket: this.bucket }));
    return { ok: true, bucket: this.bucket };
  }

  async close(): Promise<void> {
    this.client.destroy();
  }
}
