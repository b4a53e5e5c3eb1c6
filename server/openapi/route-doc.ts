// The shape of one row of the route table (route-docs.ts) and the helpers the per-resource tables share.
import type { z } from 'zod';
import { reorderAttachedPhotosInput, updateAttachedPhotoInput } from '@shared/schemas/attached-photo.ts';

/**
 * Who may call a route: anyone (`visitor`, signed in or not); a browser session only (`session`: cookie, and the
 * CSRF header on writes); or a session or a personal API token (`session-or-token`, within the token's scopes).
 */
export type AuthNeed = 'visitor' | 'session' | 'session-or-token';

export type DocMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** A multipart upload: photos, or one image to decode, and these text fields (described by hand: multer reads them). */
export interface MultipartBody {
  kind: 'photos' | 'image';
  fields: Record<string, { type: string; description: string; required?: boolean }>;
}

export interface RouteDoc {
  method: DocMethod;
  /** Express form, as registered: `/api/runs/:runId`. */
  path: string;
  summary: string;
  description?: string;
  tag: string;
  auth: AuthNeed;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  multipart?: MultipartBody;
  /** Honours `Idempotency-Key` (server/middleware/idempotency.ts). */
  idempotent?: boolean;
  /** Token scope that reaches it, for `session-or-token`. */
  scope?: 'runs:write' | 'read';
  response: { status: number; description: string; contentType?: string };
  /** Error statuses beyond those the table derives (400 for input, 401/403 for auth, 404 for ids, 409 for keys). */
  errors?: number[];
  example?: unknown;
}

export const json = (status: number, description: string) => ({ status, description });
export const noContent = (description: string) => ({ status: 204, description });

export const photosUpload = (withEntry: boolean): MultipartBody => ({
  kind: 'photos',
  fields: {
    photos: {
      type: 'binary[]',
      description: '1–10 image files (JPEG, PNG, WebP, GIF, AVIF, HEIC); re-encoded to WebP, metadata dropped.',
      required: true,
    },
    alt: { type: 'string | string[]', description: 'Alt text, once per photo in order or once for all.', required: true },
    ...(withEntry ? { entryId: { type: 'integer', description: 'Log entry the photos belong to.' } } : {}),
  },
});

/** Photo routes of a part or listing (attached-photo.routes.ts). */
export function attachedPhotoDocs(
  base: string,
  idName: string,
  tag: string,
  what: string,
  idParams: z.ZodType,
  photo: z.ZodType,
): RouteDoc[] {
  return [
    {
      method: 'POST',
      path: `${base}/:${idName}/photos`,
      summary: `Add photos to a ${what}`,
      tag,
      auth: 'session',
      params: idParams,
      multipart: photosUpload(false),
      idempotent: true,
      response: json(201, 'The stored photos.'),
      errors: [413, 507],
    },
    {
      method: 'PUT',
      path: `${base}/:${idName}/photos/order`,
      summary: `Reorder a ${what}'s photos`,
      tag,
      auth: 'session',
      params: idParams,
      body: reorderAttachedPhotosInput,
      response: json(200, 'The photos in their new order.'),
    },
    {
      method: 'PATCH',
      path: `${base}/:${idName}/photos/:photoId`,
      summary: `Change a ${what} photo's alt text`,
      tag,
      auth: 'session',
      params: photo,
      body: updateAttachedPhotoInput,
      response: json(200, 'The photo.'),
    },
    {
      method: 'DELETE',
      path: `${base}/:${idName}/photos/:photoId`,
      summary: `Remove a ${what} photo`,
      tag,
      auth: 'session',
      params: photo,
      response: noContent('Removed.'),
    },
  ];
}
