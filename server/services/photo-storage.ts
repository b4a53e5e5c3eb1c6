import { createHash } from 'node:crypto';
import sharp, { type Metadata } from 'sharp';
import { fileTypeFromBuffer } from 'file-type';
import pLimit from 'p-limit';
import { availableParallelism } from 'node:os';
import { AppError } from '../errors.ts';
import type { PhotoStore } from '../storage/photo-store.ts';

export const MAX_FILE_BYTES = 20 * 1024 * 1024;
export const MAX_FILES_PER_UPLOAD = 10;
/** 50 megapixels: a little above the largest phone and DSLR photos, far below a decompression bomb. */
export const MAX_INPUT_PIXELS = 50_000_000;
const DISPLAY_EDGE = 1600;
const THUMB_EDGE = 400;

/** An upload refused for what its bytes are (415, 413 or 400 with its own code), so the client can say why. */
export class ImageRejectedError extends AppError {}

/** HEIC needs an HEVC decoder, which sharp's prebuilt libvips leaves out (AVIF only); accept it only where this build reads it. */
function readsHeic(): boolean {
  return sharp.format.heif?.input.fileSuffix?.includes('.heic') ?? false;
}

/** Sniffed MIME type → the decoder sharp must then report; anything else (SVG, GIF, HTML, text…) is refused. */
const ACCEPTED = new Map<string, string>([
  ['image/jpeg', 'jpeg'],
  ['image/png', 'png'],
  ['image/webp', 'webp'],
  ['image/avif', 'heif'],
  ...(readsHeic()
    ? ([
        ['image/heic', 'heif'],
        ['image/heif', 'heif'],
      ] as const)
    : []),
]);

/** The image types an upload may be, for messages and the client's `accept` attribute. */
export const ACCEPTED_IMAGE_TYPES: readonly string[] = [...ACCEPTED.keys()];

export interface StoredVariant {
  /** Content-hash file name in the photo store. */
  file: string;
  bytes: Buffer;
  width: number;
  height: number;
}

export interface ProcessedPhoto {
  /** sha256 of the display variant's bytes; both file names derive from it, so the pair shares one indexed key. */
  contentHash: string;
  display: StoredVariant;
  thumb: StoredVariant;
}

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const reject = (status: number, code: string, message: string, index: number) => new ImageRejectedError(status, code, message, { index });

/**
 * Check one upload and turn it into the two WebP variants, in memory: the type comes from the bytes
 * (never the name or the client's MIME type), the pixel count is bounded before decoding, the
 * image is auto-oriented and every piece of metadata (EXIF with GPS, XMP, ICC) is left behind.
 */
export function processPhoto(input: Buffer, index = 0): Promise<ProcessedPhoto> {
  return conversions(() => convert(input, index));
}

/**
 * At most this many photos are decoded and re-encoded at once in this process; more requests wait
 * their turn. Each conversion holds a decoded image (a 12 MP photo is about 36 MB of pixels) and
 * libvips already spreads one conversion over the cores, so running more at once only adds memory.
 */
export const MAX_CONCURRENT_CONVERSIONS = Math.max(1, Math.min(4, availableParallelism()));
const conversions = pLimit(MAX_CONCURRENT_CONVERSIONS);
/** How many conversions run and wait right now (for tests and diagnostics). */
export const conversionLoad = () => ({ active: conversions.activeCount, waiting: conversions.pendingCount });

async function convert(input: Buffer, index: number): Promise<ProcessedPhoto> {
  if (input.length === 0) throw reject(400, 'empty_file', 'The file is empty.', index);
  const sniffed = await fileTypeFromBuffer(input);
  const decoder = sniffed && ACCEPTED.get(sniffed.mime);
  if (!decoder) {
    throw reject(
      415,
      'unsupported_media_type',
      `Photos must be ${ACCEPTED_IMAGE_TYPES.map((t) => t.slice(6).toUpperCase()).join(', ')}.`,
      index,
    );
  }
  let meta: Metadata;
  try {
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch {
    throw reject(400, 'unreadable_image', 'The image is damaged or incomplete.', index);
  }
  if (meta.format !== decoder) throw reject(415, 'unsupported_media_type', 'The file is not the image type it starts like.', index);
  if (!meta.width || !meta.height) throw reject(400, 'unreadable_image', 'The image has no size.', index);
  if (meta.width * meta.height > MAX_INPUT_PIXELS) {
    throw reject(413, 'image_too_large', `The image has more than ${MAX_INPUT_PIXELS / 1e6} megapixels.`, index);
  }

  const oriented = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'warning' }).rotate();
  const variant = (edge: number, quality: number) =>
    oriented
      .clone()
      .resize(edge, edge, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality })
      .toBuffer({ resolveWithObject: true });
  let display: Awaited<ReturnType<typeof variant>>;
  let thumb: Awaited<ReturnType<typeof variant>>;
  try {
    [display, thumb] = await Promise.all([variant(DISPLAY_EDGE, 82), variant(THUMB_EDGE, 76)]);
  } catch (err) {
    if (err instanceof Error && /pixel limit/i.test(err.message))
      throw reject(413, 'image_too_large', 'The image has too many pixels.', index);
    throw reject(400, 'unreadable_image', 'The image is damaged or incomplete.', index);
  }
  const contentHash = sha256(display.data);
  return {
    contentHash,
    display: { file: `${contentHash}.webp`, bytes: display.data, width: display.info.width, height: display.info.height },
    thumb: { file: `${contentHash}-t.webp`, bytes: thumb.data, width: thumb.info.width, height: thumb.info.height },
  };
}

/**
 * Put the variants in the store under their content-hash names and return only the files this call
 * created, so a failed request removes exactly those. A file that already exists is the same
 * content and is not written again.
 */
export function writeVariants(store: PhotoStore, photos: ProcessedPhoto[]): Promise<string[]> {
  return store.putMissing(new Map(photos.flatMap((p) => [p.display, p.thumb]).map((v) => [v.file, v.bytes])));
}

const lockTails = new Map<string, Promise<void>>();

async function acquire(key: string): Promise<() => void> {
  const previous = lockTails.get(key) ?? Promise.resolve();
  let release!: () => void;
  const held = new Promise<void>((resolve) => (release = resolve));
  const tail = previous.then(() => held);
  lockTails.set(key, tail);
  await previous;
  return () => {
    release();
    if (lockTails.get(key) === tail) lockTails.delete(key);
  };
}

/**
 * Run `fn` while no other request in this process writes or deletes the files of these content
 * hashes, so an upload's clean-up and a delete's "still referenced?" check cannot interleave.
 */
export async function withContentLocks<T>(hashes: Iterable<string>, fn: () => Promise<T>): Promise<T> {
  const releases: Array<() => void> = [];
  try {
    for (const hash of [...new Set(hashes)].sort()) releases.push(await acquire(hash));
    return await fn();
  } finally {
    for (const release of releases.reverse()) release();
  }
}
