// The life cycle of stored photo files shared by build, part and listing photos: convert every
// upload before anything is written, put the files down before the rows, and remove files only
// when no row of any photo table still shows their content.
import { ListingPhoto } from '../models/listing-photo.model.ts';
import { PartPhoto } from '../models/part-photo.model.ts';
import { Photo } from '../models/photo.model.ts';
import { ValidationError } from '../errors.ts';
import type { PhotoStore } from '../storage/photo-store.ts';
import { processPhoto, withContentLocks, writeVariants, type ProcessedPhoto } from './photo-storage.ts';

interface StoredFiles {
  contentHash: string;
  displayFile: string;
  thumbFile: string;
}

/** One alt text per file, in order, or a single one for all. */
export function altsFor(alt: string[], count: number): string[] {
  if (alt.length === 1) return Array.from({ length: count }, () => alt[0]);
  if (alt.length === count) return alt;
  const message = `Send one alt text per photo (${count}) or one for all.`;
  throw new ValidationError(`alt: ${message}`, [{ path: 'alt', message, code: 'alt_count' }]);
}

/** The columns a converted photo fills in any photo table (files, hash, display size). */
export function storedColumns(p: ProcessedPhoto) {
  return {
    contentHash: p.contentHash,
    displayFile: p.display.file,
    thumbFile: p.thumb.file,
    width: p.display.width,
    height: p.display.height,
  };
}

/** Check and convert every upload (one at a time, bounding memory); the first refusal names its file index. */
export async function processAll(files: Buffer[]): Promise<ProcessedPhoto[]> {
  const processed: ProcessedPhoto[] = [];
  for (const [index, file] of files.entries()) processed.push(await processPhoto(file, index));
  return processed;
}

/** Remove files of content nobody references any more; checked by the indexed content hash in every photo table. */
export async function pruneUnreferenced(store: PhotoStore, byHash: Map<string, string[]>): Promise<void> {
  for (const [contentHash, files] of byHash) {
    const counts = await Promise.all([Photo, ListingPhoto, PartPhoto].map((m) => (m as typeof Photo).count({ where: { contentHash } })));
    if (counts.every((n) => n === 0)) await store.remove(files);
  }
}

/** Files of the given photo rows grouped by content hash, for pruning after the rows are gone. */
export function filesByHash(rows: StoredFiles[]): Map<string, string[]> {
  const map = new Map<string, string[]>();
  for (const r of rows) map.set(r.contentHash, [r.displayFile, r.thumbFile]);
  return map;
}

/** After photo rows are deleted: remove their files unless another photo shows the same content. */
export async function pruneAfterRemoval(store: PhotoStore, rows: StoredFiles[]): Promise<void> {
  const byHash = filesByHash(rows);
  await withContentLocks(byHash.keys(), () => pruneUnreferenced(store, byHash));
}

/**
 * Write the converted photos' files, then run `record` (which inserts the rows in a transaction).
 * If it fails, the files this call created are removed again unless another row already uses the
 * same content, and the original failure is rethrown.
 */
export async function storeThenRecord<T>(store: PhotoStore, processed: ProcessedPhoto[], record: () => Promise<T>): Promise<T> {
  return withContentLocks(
    processed.map((p) => p.contentHash),
    async () => {
      const created = await writeVariants(store, processed);
      try {
        return await record();
      } catch (err) {
        const byHash = new Map<string, string[]>();
        for (const file of created) byHash.set(file.slice(0, 64), [...(byHash.get(file.slice(0, 64)) ?? []), file]);
        // The original failure is what the client needs to hear about; a leftover file is the lesser harm.
        await pruneUnreferenced(store, byHash).catch(() => undefined);
        throw err;
      }
    },
  );
}
