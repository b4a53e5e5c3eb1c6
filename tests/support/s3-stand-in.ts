// The S3 stand-in for tests: s3rver on a free loopback port with one bucket, and a client for looking inside it.
import { join } from 'node:path';
import S3rver from 's3rver';
import { S3Client } from '@aws-sdk/client-s3';
import { freePort } from '../../scripts/lib/scratch.mjs';

/** s3rver's built-in access key and secret. */
export const S3RVER_KEY = 'S3RVER';

export interface S3StandIn {
  endpoint: string;
  client: S3Client;
  close(): Promise<void>;
}

/** Starts s3rver with `bucket`, its files under `dir/s3`. */
export async function startS3StandIn(dir: string, bucket: string): Promise<S3StandIn> {
  const port = await freePort();
  const s3 = new S3rver({
    port,
    address: '127.0.0.1',
    silent: true,
    directory: join(dir, 's3'),
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await s3.run();
  const endpoint = `http://127.0.0.1:${port}`;
  const client = new S3Client({
    endpoint,
    region: 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: S3RVER_KEY, secretAccessKey: S3RVER_KEY },
  });
  return {
    endpoint,
    client,
    async close() {
      client.destroy();
      await s3.close();
    },
  };
}
