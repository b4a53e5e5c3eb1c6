import { ApiError } from '@/lib/api-client.ts';

/** Largest photo the server accepts (server/services/photo-storage.ts MAX_FILE_BYTES); checked here only to save a wasted upload. */
export const MAX_PHOTO_BYTES = 20 * 1024 * 1024;
/** What the server can read, for the file picker's `accept`; the server decides from the bytes. */
export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp,image/avif';

const UNREADABLE = 'That file is not a photo we can read.';
const FALLBACK = 'That did not work; try again.';

/** What to tell a person about a failed photo request (upload or delete), in one sentence. */
export function requestErrorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return FALLBACK;
}

/** One upload's failure in words a maker can act on. */
export function photoErrorMessage(error: unknown): string {
  if (!(error instanceof ApiError)) return requestErrorMessage(error);
  switch (error.code) {
    case 'unsupported_media_type':
      return `${UNREADABLE} ${error.message}`;
    case 'unreadable_image':
      return `${UNREADABLE} ${error.message}`;
    case 'empty_file':
    case 'file_too_large':
    case 'image_too_large':
      return error.message;
    case 'validation_failed': {
      const first = Array.isArray(error.details) ? (error.details[0] as { message?: string } | undefined) : undefined;
      return first?.message ?? error.message;
    }
    default:
      return requestErrorMessage(error);
  }
}

/** "2.4 MB", "380 kB": a file size for the upload list. */
export function fileSize(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`;
}
