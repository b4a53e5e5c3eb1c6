import { randomBytes } from 'node:crypto';
import { mkdir, statfs, unlink, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';

/** Bytes an unprivileged process may still write on the file system holding `dir` (statfs: bavail × bsize). */
export async function freeBytes(dir: string): Promise<number> {
  // Before the first upload the directory may not exist yet: its parent is on the same file system.
  const s = await statfs(dir).catch((err: NodeJS.ErrnoException) => (err.code === 'ENOENT' ? statfs(dirname(dir)) : Promise.reject(err)));
  return s.bavail * s.bsize;
}

/** Create and remove a tiny file in `dir` (made if missing); throws the file system's error when it cannot. */
export async function probeWritable(dir: string): Promise<void> {
  await mkdir(dir, { recursive: true });
  const file = join(dir, `.ready-${process.pid}-${randomBytes(4).toString('hex')}`);
  await writeFile(file, 'ok', { flag: 'wx' });
  await unlink(file);
}

/** The file system is full (ENOSPC) or the user's quota is (EDQUOT). */
export const isNoSpace = (err: unknown): boolean => /^(ENOSPC|EDQUOT)$/.test((err as NodeJS.ErrnoException | null)?.code ?? '');
