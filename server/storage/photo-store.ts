// Where photo files live. Every photo (build, part, listing) is two WebP variants named by their content hash;
// the services write, read and delete them only through a PhotoStore, so one instance or many see the same files.
// `npm start` keeps them on local disk (LocalPhotoStore, UPLOADS_DIR); with S3_BUCKET set they go to an
// S3-compatible bucket (S3PhotoStore, for several app instances: nothing photo-related stays instance-local).
import type { RequestHandler } from 'express';

/** Stored variant names: 64 hex digits of the display variant's sha256, `-t` for the thumbnail. */
const STORED_NAME = /^[a-f0-9]{64}(-t)?\.webp$/;
export const isStoredName = (name: string): boolean => STORED_NAME.test(name);

/** Served photo files never change (content-hash names): cacheable for 30 days, immutable. */
export const PHOTO_CACHE_CONTROL = 'public, max-age=2592000, immutable';

export interface StoreCheck {
  ok: boolean;
  [detail: string]: unknown;
}

export interface PhotoStore {
  readonly kind: 'local' | 's3';
  /**
   * Store each file under its name unless a file of that name is already there (the same content), and return
   * the names this call created, so a failed request removes exactly those.
   */
  putMissing(files: ReadonlyMap<string, Buffer>): Promise<string[]>;
  /** The stored bytes, or null when there is no such file. */
  read(name: string): Promise<Buffer | null>;
  /** Delete files by name; names that are not stored-variant names are ignored, missing files are no error. */
  remove(names: Iterable<string>): Promise<void>;
  /** The handler mounted at `/uploads` (GET/HEAD `/<name>`, the cache headers above, 404 in the error shape). */
  handler(): RequestHandler;
  /** For /api/ready: can files be written now (and, on disk, is there room)? */
  check(minFreeMb: number): Promise<StoreCheck>;
  close(): Promise<void>;
}
