import { useCallback, useEffect, useRef, useState } from 'react';
import type { PhotoUploadVariables } from '@/lib/photo-upload.ts';
import { fileSize, MAX_PHOTO_BYTES, photoErrorMessage } from './photo-errors.ts';

export type QueuedState = 'ready' | 'queued' | 'uploading' | 'processing' | 'done' | 'failed';

/** A file picked for upload, with its own alt text, progress (0–1) and outcome. */
export interface QueuedPhoto {
  key: string;
  file: File;
  previewUrl: string;
  alt: string;
  state: QueuedState;
  progress: number;
  error?: string;
  /** Set when Upload was pressed while the alt text was still empty. */
  altMissing?: boolean;
}

/**
 * Sends one photo (an upload mutation's `mutateAsync`); `E` is whatever else the place needs with
 * every file (a build's log entry), handed to `uploadAll`.
 */
export type SendPhoto<E extends object> = (photo: PhotoUploadVariables & E) => Promise<unknown>;

let counter = 0;

/** The upload list: each file is sent as its own request (in turn), so each has its own progress bar and error. */
export function usePhotoQueue<E extends object>(send: SendPhoto<E>) {
  const [items, setItems] = useState<QueuedPhoto[]>([]);
  const aborts = useRef(new Map<string, AbortController>());
  const urls = useRef(new Set<string>());
  const removed = useRef(new Set<string>());

  useEffect(() => {
    const controllers = aborts.current;
    const previews = urls.current;
    return () => {
      controllers.forEach((c) => c.abort());
      previews.forEach((u) => URL.revokeObjectURL(u));
    };
  }, []);

  const patch = useCallback((key: string, change: Partial<QueuedPhoto>) => {
    setItems((list) => list.map((i) => (i.key === key ? { ...i, ...change } : i)));
  }, []);

  const add = useCallback((files: Iterable<File>) => {
    const added = Array.from(files, (file): QueuedPhoto => {
      const previewUrl = URL.createObjectURL(file);
      urls.current.add(previewUrl);
      const tooBig = file.size > MAX_PHOTO_BYTES;
      return {
        key: `photo-${++counter}`,
        file,
        previewUrl,
        alt: '',
        progress: 0,
        state: tooBig ? 'failed' : 'ready',
        error: tooBig ? `This file is ${fileSize(file.size)}; each photo may be at most ${fileSize(MAX_PHOTO_BYTES)}.` : undefined,
      };
    });
    setItems((list) => [...list, ...added]);
  }, []);

  const remove = useCallback((key: string) => {
    removed.current.add(key);
    aborts.current.get(key)?.abort();
    setItems((list) => {
      const gone = list.find((i) => i.key === key);
      if (gone) {
        URL.revokeObjectURL(gone.previewUrl);
        urls.current.delete(gone.previewUrl);
      }
      return list.filter((i) => i.key !== key);
    });
  }, []);

  const setAlt = useCallback((key: string, alt: string) => patch(key, { alt, altMissing: false }), [patch]);

  const sendOne = useCallback(
    async (item: QueuedPhoto, extra: E) => {
      if (removed.current.has(item.key)) return;
      const controller = new AbortController();
      aborts.current.set(item.key, controller);
      patch(item.key, { state: 'uploading', progress: 0, error: undefined });
      try {
        await send({
          ...extra,
          file: item.file,
          alt: item.alt.trim(),
          signal: controller.signal,
          onProgress: (f) => patch(item.key, { progress: f, state: f >= 1 ? 'processing' : 'uploading' }),
        });
        patch(item.key, { state: 'done', progress: 1 });
      } catch (err) {
        patch(item.key, { state: 'failed', error: photoErrorMessage(err) });
      } finally {
        aborts.current.delete(item.key);
      }
    },
    [patch, send],
  );

  /** Send every file that is ready (or failed and may be retried); returns the keys still lacking alt text. */
  const uploadAll = useCallback(
    (extra: E): string[] => {
      const waiting = items.filter((i) => i.state === 'ready' || (i.state === 'failed' && i.file.size <= MAX_PHOTO_BYTES));
      const missing = waiting.filter((i) => !i.alt.trim()).map((i) => i.key);
      if (missing.length > 0) {
        setItems((list) => list.map((i) => (missing.includes(i.key) ? { ...i, altMissing: true } : i)));
        return missing;
      }
      // One after another, so the gallery keeps the order the files were picked in.
      setItems((list) =>
        list.map((i) => (waiting.some((w) => w.key === i.key) ? { ...i, state: 'queued', progress: 0, error: undefined } : i)),
      );
      void (async () => {
        for (const i of waiting) await sendOne(i, extra);
      })();
      return [];
    },
    [items, sendOne],
  );

  const clearDone = useCallback(() => items.filter((i) => i.state === 'done').forEach((i) => remove(i.key)), [items, remove]);

  return { items, add, remove, setAlt, uploadAll, clearDone };
}
