import { upload } from './api-client.ts';

/** One photo on its way up: the file, its required alt text, and the hooks of its own progress bar. */
export interface PhotoUploadVariables {
  file: File;
  alt: string;
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/**
 * Send one photo as its own multipart request (field `photos`, then `alt`, then any `fields`), so each
 * file gets its own progress and its own refusal; answers the stored photo.
 */
export async function uploadOnePhoto<P>(
  path: string,
  { file, alt, onProgress, signal }: PhotoUploadVariables,
  fields: Record<string, string> = {},
): Promise<P> {
  const form = new FormData();
  form.append('photos', file, file.name);
  form.append('alt', alt);
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  const res = await upload<{ photos: P[] }>(path, form, onProgress, { signal });
  return res.photos[0];
}
