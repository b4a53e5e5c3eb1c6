// The photo store the configuration asks for (see photo-store.ts).
import type { Config } from '../config.ts';
import { LocalPhotoStore } from './local-photo-store.ts';
import type { PhotoStore } from './photo-store.ts';

/** The store the configuration asks for: S3 when a bucket is set, else the uploads folder. */
export async function createPhotoStore(config: Pick<Config, 'uploadsDir' | 's3'>): Promise<PhotoStore> {
  if (!config.s3) return new LocalPhotoStore(config.uploadsDir);
  // Loaded only when a bucket is configured: the SDK is large and the single-machine set-up does not use it.
  const { createS3PhotoStore } = await import('./s3-photo-store.ts');
  return createS3PhotoStore(config.s3);
}
