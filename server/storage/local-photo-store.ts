// Photo files in a local folder (the single-machine default): written whole (temp file, then hard link), served by
// express.static with the photo cache headers, removed by name.
import { randomBytes } from 'node:crypto';
import { link, mkdir, readFile, stat, unlink, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import express, { type RequestHandler } from 'express';
import { InsufficientStorageError } from '../errors.ts';
import { freeBytes, isNoSpace, probeWritable } from '../ops/disk-space.ts';
import { isStoredName, type PhotoStore, type StoreCheck } from './photo-store.ts';

const MB = 1024 * 1024;
const isMissing = (err: unknown) => (err as NodeJS.ErrnoException).code === 'ENOENT';
const exists = (path: string) =>
  stat(path).then(
    () => true,
    (err) => (isMissing(err) ? false : Promise.reject(err)),
  );

export class LocalPhotoStore implements PhotoStore {
  readonly kind = 'local';
  constructor(readonly dir: string) {}

  async putMissing(files: ReadonlyMap<string, Buffer>): Promise<string[]> {
    await mkdir(this.dir, { recursive: true });
    const created: string[] = [];
    try {
      for (const [name, bytes] of files) {
        const target = join(this.dir, name);
        if (await exists(target)) continue;
        const temp = join(this.dir, `.tmp-${randomBytes(8).toString('hex')}`);
        try {
          await writeFile(temp, bytes, { flag: 'wx' });
          await link(temp, target).then(
            () => void created.push(name),
            (err: NodeJS.ErrnoException) => (err.code === 'EEXIST' ? undefined : Promise.reject(err)),
          );
        } finally {
          await unlink(temp).catch(() => undefined);
        }
      }
    } catch (err) {
      await this.remove(created).catch(() => undefined);
      // A full disk is the server's state, not the upload's fault: 507 and a message to try later.
      throw isNoSpace(err) ? new InsufficientStorageError() : err;
    }
    return created;
  }

  async read(name: string): Promise<Buffer | null> {
    if (!isStoredName(name)) return null;
    return readFile(join(this.dir, name)).catch((err) => (isMissing(err) ? null : Promise.reject(err)));
  }

  async remove(names: Iterable<string>): Promise<void> {
    for (const name of new Set(names)) {
      if (!isStoredName(name)) continue;
      await unlink(join(this.dir, name)).catch((err) => (isMissing(err) ? undefined : Promise.reject(err)));
    }
  }

  handler(): RequestHandler {
    return express.static(resolve(this.dir), { index: false, immutable: true, maxAge: '30d', fallthrough: false });
  }

  async check(minFreeMb: number): Promise<StoreCheck> {
    await probeWritable(this.dir);
    const freeMb = Math.floor((await freeBytes(this.dir)) / MB);
    return { ok: freeMb >= minFreeMb, writable: true, freeMb, minFreeMb };
  }

  async close(): Promise<void> {}
}
