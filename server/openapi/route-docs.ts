// One description per route of the app: the OpenAPI document (openapi-document.ts) is built from this table and
// the shared zod schemas the routes parse with. tests/api/openapi.test.ts fails when a route of the app is missing
// here (or one listed here does not exist), when an example stops validating, or when `auth` or `idempotent` disagree
// with what the server does.
import { z } from 'zod';
import { actuatorIdParams, createActuatorInput, updateActuatorInput } from '@shared/schemas/actuator.ts';
import { driveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { driveTableQuery, saveLinearisationInput } from '@shared/schemas/linearise.ts';
import { apiTokenIdParams, createApiTokenInput } from '@shared/schemas/api-token.ts';
import {
  listingPhotoParams,
  partPhotoParams,
  reorderAttachedPhotosInput,
  updateAttachedPhotoInput,
} from '@shared/schemas/attached-photo.ts';
import {
  buildIdParams,
  createBuildInput,
  createEntryInput,
  entryParams,
  listBuildsQuery,
  photoParams,
  reorderPhotosInput,
  updateBuildInput,
  updateEntryInput,
  updatePhotoInput,
} from '@shared/schemas/build.ts';
import {
  createListingInput,
  hideListingInput,
  listingIdParams,
  listListingsQuery,
  sendMessageInput,
  threadIdParams,
  updateListingInput,
} from '@shared/schemas/listing.ts';
import { listPartsQuery, mergePartInput, partIdParams, proposePartInput } from '@shared/schemas/part.ts';
import {
  acceptRejectInput,
  accountSettingsInput,
  auditQuery,
  buildDecisionInput,
  createReportInput,
  reportDecisionInput,
  reviewIdParams,
} from '@shared/schemas/review.ts';
import { createRunInput, runExportQuery, runIdParams, updateRunInput } from '@shared/schemas/run.ts';
import { listUsersQuery, setRoleInput, setSuspendedInput, userIdParams, userTokenParams } from '@shared/schemas/user.ts';
import { mailIdParams } from '@shared/schemas/outbox.ts';
import { calculators } from '@shared/workbench/calculators/all-calculators.ts';
import { RIG_RUN_BODY } from '@shared/docs/rig-examples.ts';
import { commentIdParams, createCommentInput, hideCommentInput } from '@shared/schemas/comment.ts';

/**
 * Who may call a route: anyone (`visitor`, signed in or not); a browser session only (`session`: cookie, and the
 * CSRF header on writes); or a session or a personal API token (`session-or-token`, within the token's scopes).
 */
export type AuthNeed = 'visitor' | 'session' | 'session-or-token';

export type DocMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** A multipart upload: photos, or one image to decode, and these text fields (described by hand: multer reads them). */
interface MultipartBody {
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

const json = (status: number, description: string) => ({ status, description });
const noContent = (description: string) => ({ status: 204, description });

const photosUpload = (withEntry: boolean): MultipartBody => ({
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
function attachedPhotoDocs(base: string, idName: string, tag: string, what: string, idParams: z.ZodType, photo: z.ZodType): RouteDoc[] {
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

/** What each workbench page computes, by slug; a calculator without a line here is still documented. */
const WORKBENCH_SUMMARIES: Record<string, string> = {
  fit: 'Fit a calibration curve (gain, R², nonlinearity, hysteresis)',
  'peak-to-peak': 'Gain from two peak-to-peak readings, with uncertainty and bounds',
  creep: 'Fit logarithmic creep and project it',
  'expected-gain': 'Expected gain of a bender, stack or tube from its geometry and material',
  mixing: 'Drive voltages for a wanted X/Y displacement through a gain matrix',
  'mixing-fit': 'Fit a two-axis gain matrix from a grid of readings',
  linearise: 'Polynomial per sweep branch and the table of volts that linearises the drive',
  lattice: 'Lateral scale (nm per pixel, skew, rotation, gains) from an image of a lattice of known spacing',
  'scan-plan': 'Step size, range and timing of a raster scan',
  resonance: 'First resonance of a cantilevered bender, with a tip mass',
  'drive-current': 'Peak current to drive a capacitive load with a sine',
  tunnelling: 'Tunnelling current decay per ångström for a barrier height',
  convert: 'Convert displacements, voltages or gains between units',
  'loaded-gain': 'Gain of an actuator working against a spring and preload',
  tube: 'Capacitance, resonance and gain of a piezo tube',
  'drive-limits': 'What an amplifier can drive: current, slew and RC limits',
  'noise-floor': 'Displacement noise floor of a scanner chain',
  'sine-fit': 'Fit a sine drive and displacement record (IEEE Std 1057): gain and phase lag',
};

/** Request examples of the calculators a rig or script is most likely to call. */
const WORKBENCH_EXAMPLES: Record<string, unknown> = {
  fit: { points: RIG_RUN_BODY.points, displacementUnit: 'nm' },
  'peak-to-peak': { displacementPpNm: 8000, voltsPpV: 120, displacementResolutionNm: 1000, voltsResolutionV: 1 },
  'drive-current': { capacitanceF: 1e-6, amplitudeV: 150, frequencyHz: 100 },
  convert: { value: 3, from: 'angstrom/V', to: 'uin/V' },
};

const workbenchDocs: RouteDoc[] = calculators.map((c) => ({
  method: 'POST',
  path: `/api/workbench/${c.slug}`,
  summary: WORKBENCH_SUMMARIES[c.slug] ?? `Workbench calculation: ${c.slug}`,
  description:
    'A pure calculation: nothing is stored and no sign-in or CSRF token is needed. The answer is the figures, warnings and ' +
    'safety cautions the workbench page shows for the same input.',
  tag: 'Workbench',
  auth: 'visitor',
  body: c.input,
  response: json(200, 'The result as the workbench page shows it, with `warnings` and `cautions`.'),
  errors: [413, 429],
  ...(WORKBENCH_EXAMPLES[c.slug] ? { example: WORKBENCH_EXAMPLES[c.slug] } : {}),
}));

const imageHeightsDoc: RouteDoc = {
  method: 'POST',
  path: '/api/workbench/image-heights',
  summary: 'Decode a greyscale PNG or TIFF height image into rows of numbers (for the lattice calculation)',
  description:
    'Nothing is stored. 8- and 16-bit PNG and TIFF, and 32-bit float TIFF; colour becomes the mean of R, G and B. At most 1024 × 1024 ' +
    'pixels (400 `image_too_large`), at least 16 × 16 (`image_too_small`); other formats 415 `unsupported_image`; unreadable files 400 ' +
    '`unreadable_image`. Answers `{ format, width, height, bitDepth, heights }`, the rows ready for POST /api/workbench/lattice.',
  tag: 'Workbench',
  auth: 'visitor',
  multipart: {
    kind: 'image',
    fields: { image: { type: 'binary', description: 'One PNG or TIFF file, at most 8 MB.', required: true } },
  },
  response: json(200, 'The image as rows of numbers, top row first.'),
  errors: [413, 415, 429],
};

/** Pages and files for link previews, feed readers and crawlers (share.routes.ts): not JSON, but public routes. */
const feedId = (name: string) =>
  z.strictObject({
    [name]: z
      .string()
      .regex(/^[1-9]\d{0,9}\.atom$/)
      .describe('The id followed by .atom'),
  });
const pageWithCard = (path: string, what: string): RouteDoc => ({
  method: 'GET',
  path,
  summary: `The page of ${what}, with its share card`,
  description:
    'The client page with Open Graph and Twitter-card meta tags (title, summary, cover image) and its Atom feeds as ' +
    '`<link rel="alternate">`, so a pasted link previews. Visitors’ view only: anything a visitor cannot see answers the plain page with 404.',
  tag: 'Links and feeds',
  auth: 'visitor',
  response: { status: 200, description: 'HTML.', contentType: 'text/html' },
  errors: [404],
});
const commentDocs: RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/builds/:buildId/comments',
    summary: 'Comments on a published build, oldest first (hidden ones are not listed)',
    tag: 'Comments',
    auth: 'visitor',
    params: buildIdParams,
    response: json(200, '`{ items: [...] }`, each with its Markdown body and what you may do with it.'),
    errors: [404, 409],
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/comments',
    summary: 'Comment on a published build (Markdown); the build’s owner is mailed',
    description: 'At most 10 comments per 10 minutes per maker (429). A build that is not published answers 409 `build_not_published`.',
    tag: 'Comments',
    auth: 'session',
    params: buildIdParams,
    body: createCommentInput,
    response: json(201, 'The comment.'),
    errors: [409, 429],
  },
  {
    method: 'POST',
    path: '/api/comments/:commentId/hide',
    summary: 'Hide a comment, with a note on the audit trail (moderators, not on their own comment or build)',
    tag: 'Comments',
    auth: 'session',
    params: commentIdParams,
    body: hideCommentInput,
    response: noContent('Hidden: it leaves the list for everyone.'),
  },
];

const shareDocs: RouteDoc[] = [
  pageWithCard('/builds/:id', 'a published build'),
  pageWithCard('/parts/:id', 'a registry part'),
  pageWithCard('/exchange/:id', 'an exchange listing'),
  pageWithCard('/builds', 'the builds index'),
  {
    method: 'GET',
    path: '/feeds/builds.atom',
    summary: 'Atom feed of newly published builds (RFC 4287)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'The newest 50 published builds.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/feeds/builds/:buildId',
    summary: 'Atom feed of a published build’s log entries',
    tag: 'Links and feeds',
    auth: 'visitor',
    params: feedId('buildId'),
    response: { status: 200, description: 'The build’s newest 50 log entries.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/feeds/parts/:partId',
    summary: 'Atom feed of a part’s newly accepted runs',
    tag: 'Links and feeds',
    auth: 'visitor',
    params: feedId('partId'),
    response: { status: 200, description: 'The part’s newest 50 accepted runs of published builds.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/sitemap.xml',
    summary: 'Sitemap of every public page (sitemaps.org 0.9)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'Published builds, accepted parts, open listings.', contentType: 'application/xml' },
  },
  {
    method: 'GET',
    path: '/robots.txt',
    summary: 'What crawlers may read (RFC 9309)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'Plain text.', contentType: 'text/plain' },
  },
];

const datasetFile = (file: string, summary: string, contentType: string): RouteDoc => ({
  method: 'GET',
  path: `/api/registry/dataset/${file}`,
  summary,
  description: 'Public, the same for everyone, cacheable for five minutes. Only listed parts and accepted runs of published builds.',
  tag: 'Open data',
  auth: 'visitor',
  response: { status: 200, description: `${file} of the registry dataset.`, contentType },
});

export const ROUTE_DOCS: readonly RouteDoc[] = [
  // Service
  {
    method: 'GET',
    path: '/api/health',
    summary: 'Is the service up (and its database reachable)',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'Up.'),
    errors: [503],
  },
  {
    method: 'GET',
    path: '/api/ready',
    summary: 'Should this instance get traffic (readiness)',
    description:
      'Checks the database (`SELECT 1`), that migrations are current, that the uploads directory is writable with free space ' +
      'above `READY_MIN_FREE_MB`, and that fewer than `READY_MAX_OUTBOX` mails wait to be sent; answers are cached for a second. ' +
      '200 `{ status: "ready", checks }`; 503 `not_ready` naming the failed checks in `details.failed`, or `draining` while the ' +
      'instance shuts down. `/api/health` stays the cheap liveness check.',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'Ready, with each check.'),
    errors: [503],
  },
  {
    method: 'GET',
    path: '/metrics',
    summary: 'Prometheus metrics (operators)',
    description:
      'Prometheus text format: requests by route pattern and status with latency histograms, database pool, outbox backlog and ' +
      'given-up mails, free space of the uploads disk, process memory and event-loop lag. Answered only on a loopback connection ' +
      'that no proxy forwarded, or with `Authorization: Bearer <METRICS_TOKEN>` when that is set; 404 otherwise.',
    tag: 'Service',
    auth: 'visitor',
    response: { status: 200, description: 'The metrics.', contentType: 'text/plain; version=0.0.4' },
    errors: [404],
  },
  {
    method: 'GET',
    path: '/api/openapi.json',
    summary: 'This OpenAPI 3.1 document',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'The OpenAPI document.'),
  },
  // Session and sign-in
  {
    method: 'GET',
    path: '/api/session',
    summary: 'The signed-in user (or null) and the CSRF token for writes',
    description: 'Browsers only: a personal API token is refused here (403 `token_scope`).',
    tag: 'Session',
    auth: 'visitor',
    response: json(200, '`{ user, csrfToken }`.'),
  },
  {
    method: 'GET',
    path: '/auth/github',
    summary: 'Start signing in with GitHub',
    description: 'A browser redirect, not a JSON call. `returnTo` (a path) is where the browser lands afterwards.',
    tag: 'Session',
    auth: 'visitor',
    response: { status: 302, description: 'Redirect to GitHub.' },
    errors: [429],
  },
  {
    method: 'GET',
    path: '/auth/github/callback',
    summary: 'Where GitHub sends the browser back',
    tag: 'Session',
    auth: 'visitor',
    response: { status: 302, description: 'Redirect into the app, signed in.' },
  },
  { method: 'POST', path: '/auth/logout', summary: 'Sign out', tag: 'Session', auth: 'session', response: noContent('Signed out.') },
  // Account
  {
    method: 'GET',
    path: '/api/account/settings',
    summary: 'My settings (mail opt-out)',
    tag: 'Account',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The settings.'),
  },
  {
    method: 'PATCH',
    path: '/api/account/settings',
    summary: 'Change my settings',
    tag: 'Account',
    auth: 'session',
    body: accountSettingsInput,
    response: json(200, 'The settings.'),
    example: { mailOptOut: true },
  },
  {
    method: 'GET',
    path: '/api/account/data-licence',
    summary: 'The data licence and whether I accepted it',
    tag: 'Account',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, '`{ licence, acceptedAt }`.'),
  },
  {
    method: 'POST',
    path: '/api/account/data-licence',
    summary: 'Accept the data licence (CC BY 4.0) for what I contribute',
    description: 'Idempotent: accepting again keeps the first date. Runs are not refused without it; the app asks once.',
    tag: 'Account',
    auth: 'session',
    response: json(200, '`{ licence, acceptedAt }`.'),
  },
  {
    method: 'GET',
    path: '/api/account/tokens',
    summary: 'My rig tokens (never their secrets)',
    description: 'Browser session only: a token cannot list or make tokens.',
    tag: 'Account',
    auth: 'session',
    response: json(200, 'The tokens with created and last-used times.'),
  },
  {
    method: 'POST',
    path: '/api/account/tokens',
    summary: 'Create a rig token',
    description: 'The secret (`swt_…`) is in this answer only; it is stored as a hash.',
    tag: 'Account',
    auth: 'session',
    body: createApiTokenInput,
    response: json(201, '`{ id, name, scopes, token, createdAt }`.'),
    example: { name: 'Capacitive rig in the shed', scopes: ['runs:write'] },
  },
  {
    method: 'DELETE',
    path: '/api/account/tokens/:tokenId',
    summary: 'Revoke a rig token',
    tag: 'Account',
    auth: 'session',
    params: apiTokenIdParams,
    response: noContent('Revoked.'),
  },
  // Builds
  {
    method: 'GET',
    path: '/api/builds',
    summary: 'Published builds',
    tag: 'Builds',
    auth: 'visitor',
    query: listBuildsQuery,
    response: json(200, 'A page of builds.'),
  },
  {
    method: 'GET',
    path: '/api/builds/mine',
    summary: 'My builds, in every state',
    tag: 'Builds',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'My builds with their actuators (ids for posting runs).'),
  },
  {
    method: 'POST',
    path: '/api/builds',
    summary: 'Start a build log (a draft)',
    tag: 'Builds',
    auth: 'session',
    body: createBuildInput,
    idempotent: true,
    response: json(201, 'The new build.'),
    example: {
      title: 'Tripod STM from buzzer discs',
      instrumentKind: 'tunnelling-microscope',
      summary: 'A small STM on three buzzer-disc legs.',
    },
  },
  {
    method: 'GET',
    path: '/api/builds/:buildId',
    summary: 'A build with its log, photos, actuators and runs',
    description: 'Runs carry a decimated plot series; raw records come from the run export.',
    tag: 'Builds',
    auth: 'visitor',
    params: buildIdParams,
    response: json(200, 'The build.'),
  },
  {
    method: 'PATCH',
    path: '/api/builds/:buildId',
    summary: 'Edit a build',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    body: updateBuildInput,
    response: json(200, 'The build.'),
  },
  {
    method: 'DELETE',
    path: '/api/builds/:buildId',
    summary: 'Delete a build',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    response: noContent('Deleted.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/submit',
    summary: 'Submit a build for review',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    response: json(200, 'The build.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/withdraw',
    summary: 'Withdraw a submitted build back to draft',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    response: json(200, 'The build.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/entries',
    summary: 'Add a log entry',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    body: createEntryInput,
    idempotent: true,
    response: json(201, 'The entry.'),
    example: { entryDate: '2026-11-30', title: 'First tunnelling current', body: 'Saw 1 nA at 100 mV bias after the third approach.' },
  },
  {
    method: 'PATCH',
    path: '/api/builds/:buildId/entries/:entryId',
    summary: 'Edit a log entry',
    tag: 'Builds',
    auth: 'session',
    params: entryParams,
    body: updateEntryInput,
    response: json(200, 'The entry.'),
  },
  {
    method: 'DELETE',
    path: '/api/builds/:buildId/entries/:entryId',
    summary: 'Delete a log entry',
    tag: 'Builds',
    auth: 'session',
    params: entryParams,
    response: noContent('Deleted.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/photos',
    summary: 'Upload build photos',
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    multipart: photosUpload(true),
    idempotent: true,
    response: json(201, 'The stored photos.'),
    errors: [413, 507],
  },
  {
    method: 'PUT',
    path: '/api/builds/:buildId/photos/order',
    summary: "Reorder a build's photos",
    tag: 'Builds',
    auth: 'session',
    params: buildIdParams,
    body: reorderPhotosInput,
    response: json(200, 'The photos.'),
  },
  {
    method: 'PATCH',
    path: '/api/builds/:buildId/photos/:photoId',
    summary: 'Edit a build photo',
    tag: 'Builds',
    auth: 'session',
    params: photoParams,
    body: updatePhotoInput,
    response: json(200, 'The photo.'),
  },
  {
    method: 'DELETE',
    path: '/api/builds/:buildId/photos/:photoId',
    summary: 'Delete a build photo',
    tag: 'Builds',
    auth: 'session',
    params: photoParams,
    response: noContent('Deleted.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/photos/:photoId/cover',
    summary: "Make a photo the build's cover",
    tag: 'Builds',
    auth: 'session',
    params: photoParams,
    response: json(200, 'The build.'),
  },
  // Actuators and runs
  {
    method: 'POST',
    path: '/api/builds/:buildId/actuators',
    summary: 'Add an actuator (a registry part as used in the build)',
    tag: 'Actuators and runs',
    auth: 'session',
    params: buildIdParams,
    body: createActuatorInput,
    idempotent: true,
    response: json(201, 'The actuator.'),
    example: { partId: 7, label: 'Z bar', axis: 'Z', drive: 'single', maxVolts: 60 },
  },
  {
    method: 'PATCH',
    path: '/api/actuators/:actuatorId',
    summary: 'Edit an actuator',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: updateActuatorInput,
    response: json(200, 'The actuator.'),
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId',
    summary: 'Delete an actuator and its runs',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Deleted.'),
  },
  {
    method: 'PUT',
    path: '/api/actuators/:actuatorId/drive-matrix',
    summary: 'Save a two-axis drive matrix on an XY-pair actuator',
    description:
      'The gain matrix, offsets and drive limits from the mixing workbench; 201 when new, 200 when replaced; 409 `not_xy_pair` otherwise.',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: driveMatrixInput,
    response: json(200, 'The actuator with its drive matrix (201 when it had none).'),
    errors: [409],
    example: {
      gainNmPerV: [
        [70.7, -70.7],
        [70.7, 70.7],
      ],
      limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -150, vbMaxV: 150 },
    },
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId/drive-matrix',
    summary: "Remove an actuator's drive matrix",
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Removed.'),
  },
  {
    method: 'PUT',
    path: '/api/actuators/:actuatorId/linearisation',
    summary: 'Save a drive linearisation on an actuator',
    description:
      'The run to linearise (points with their sweeps, units, degree or "auto", table step); the server fits each branch and keeps ' +
      'the result and its drive table; 201 when new, 200 when replaced; 400 `not_monotonic` when a branch cannot be inverted.',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: saveLinearisationInput,
    response: json(200, 'The actuator with its linearisation summary (201 when it had none).'),
    example: {
      points: [
        { volts: 0, displacement: 0, sweep: 'up' },
        { volts: 40, displacement: 2.6, sweep: 'up' },
        { volts: 80, displacement: 5.9, sweep: 'up' },
        { volts: 120, displacement: 9.9, sweep: 'up' },
      ],
      displacementUnit: 'um',
      degree: 2,
    },
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId/linearisation',
    summary: "Remove an actuator's linearisation",
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Removed.'),
  },
  {
    method: 'GET',
    path: '/api/actuators/:actuatorId/linearisation/table',
    summary: "Download an actuator's drive table",
    description: 'CSV (`format=csv`, target_nm then the volts per branch) or a C array for a microcontroller (`format=c`).',
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: actuatorIdParams,
    query: driveTableQuery,
    response: { status: 200, description: 'The table as a file (text/csv, or text/x-c for format=c).', contentType: 'text/csv' },
  },
  {
    method: 'POST',
    path: '/api/actuators/:actuatorId/runs',
    summary: 'Record a calibration run',
    description:
      'Three kinds: `points` (a calibration curve, the default), `peak-to-peak` (two readings under a sine) and `sine-record` ' +
      '(time, drive and displacement samples). The server computes the fit; the run waits for review. At most 200 000 ' +
      'points or samples per run and 2 000 000 per build (413). Send an `Idempotency-Key` so a retry never stores it twice.',
    tag: 'Actuators and runs',
    auth: 'session-or-token',
    scope: 'runs:write',
    params: actuatorIdParams,
    body: createRunInput,
    idempotent: true,
    response: json(201, 'The stored run with its fit.'),
    errors: [413],
    example: RIG_RUN_BODY,
  },
  {
    method: 'GET',
    path: '/api/runs/:runId',
    summary: 'A run with its fit and plot series',
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: runIdParams,
    response: json(200, 'The run.'),
  },
  {
    method: 'PATCH',
    path: '/api/runs/:runId',
    summary: 'Correct a run',
    description: 'Merged over what is stored and refitted; an accepted run goes back to review.',
    tag: 'Actuators and runs',
    auth: 'session-or-token',
    scope: 'runs:write',
    params: runIdParams,
    body: updateRunInput,
    response: json(200, 'The run.'),
    errors: [413],
    example: { measuredOn: '2026-11-28', conditions: { temperatureC: 21.5, preload: 'spring, about 2 N' } },
  },
  {
    method: 'GET',
    path: '/api/runs/:runId/export',
    summary: "A run's raw points or samples as CSV or JSON, with the licence",
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: runIdParams,
    query: runExportQuery,
    response: { status: 200, description: 'The file.', contentType: 'text/csv' },
  },
  {
    method: 'DELETE',
    path: '/api/runs/:runId',
    summary: 'Delete a run',
    tag: 'Actuators and runs',
    auth: 'session',
    params: runIdParams,
    response: noContent('Deleted.'),
  },
  // Parts registry
  {
    method: 'GET',
    path: '/api/parts',
    summary: 'Search the parts registry',
    description: '`format=csv` or `format=json` (or `Accept: text/csv`) downloads the whole search.',
    tag: 'Parts registry',
    auth: 'visitor',
    query: listPartsQuery,
    response: json(200, 'A page of parts with pooled figures.'),
  },
  {
    method: 'GET',
    path: '/api/parts/histogram',
    summary: 'Histogram of listed parts by median gain',
    tag: 'Parts registry',
    auth: 'visitor',
    response: json(200, 'Log-spaced bins.'),
  },
  {
    method: 'POST',
    path: '/api/parts',
    summary: 'Propose a part for the registry',
    tag: 'Parts registry',
    auth: 'session',
    body: proposePartInput,
    idempotent: true,
    response: json(201, '`{ id, status }`.'),
    example: {
      category: 'buzzer-disc',
      name: '27 mm brass buzzer disc',
      salvageSource: 'smoke alarm',
      material: 'PZT',
      outerDiameterMm: 27,
    },
  },
  {
    method: 'GET',
    path: '/api/parts/:partId',
    summary: 'A part with its accepted runs and listings',
    tag: 'Parts registry',
    auth: 'visitor',
    params: partIdParams,
    response: json(200, 'The part.'),
  },
  {
    method: 'POST',
    path: '/api/parts/:partId/merge',
    summary: 'Merge a duplicate part into another (moderators)',
    tag: 'Parts registry',
    auth: 'session',
    params: partIdParams,
    body: mergePartInput,
    response: json(200, 'The merge.'),
  },
  ...attachedPhotoDocs('/api/parts', 'partId', 'Parts registry', 'part', partIdParams, partPhotoParams),
  // Open data
  datasetFile('README.md', 'What each dataset file and column holds, the licence and how to credit', 'text/markdown'),
  datasetFile('parts.csv', 'Listed parts with their pooled figures', 'text/csv'),
  datasetFile('runs.csv', 'Accepted runs with their figures, rounded as the pages show them', 'text/csv'),
  datasetFile('points.csv', "Every accepted run's raw points, samples or readings (long format)", 'text/csv'),
  datasetFile('dataset.json', 'Parts and runs with figures and the licence, as JSON', 'application/json'),
  // Review
  {
    method: 'GET',
    path: '/api/review/queue',
    summary: 'What waits for review (moderators)',
    tag: 'Review',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The queue.'),
  },
  {
    method: 'POST',
    path: '/api/review/builds/:id/decision',
    summary: 'Publish, return or decline a build (moderators)',
    tag: 'Review',
    auth: 'session',
    params: reviewIdParams,
    body: buildDecisionInput,
    response: json(200, '`{ id, status }`.'),
    example: { decision: 'return', note: 'Add a photo of the approach mechanism, please.' },
  },
  {
    method: 'POST',
    path: '/api/review/runs/:id/decision',
    summary: 'Accept or reject a run (moderators)',
    tag: 'Review',
    auth: 'session',
    params: reviewIdParams,
    body: acceptRejectInput,
    response: json(200, '`{ id, status }`.'),
    example: { decision: 'accept' },
  },
  {
    method: 'POST',
    path: '/api/review/parts/:id/decision',
    summary: 'Accept or reject a proposed part (moderators)',
    tag: 'Review',
    auth: 'session',
    params: reviewIdParams,
    body: acceptRejectInput,
    response: json(200, '`{ id, status }`.'),
  },
  {
    method: 'POST',
    path: '/api/review/reports/:id/decision',
    summary: 'Resolve or dismiss a report (moderators)',
    tag: 'Review',
    auth: 'session',
    params: reviewIdParams,
    body: reportDecisionInput,
    response: json(200, '`{ id, status }`.'),
  },
  {
    method: 'GET',
    path: '/api/review/audit',
    summary: 'The audit log (moderators)',
    tag: 'Review',
    auth: 'session-or-token',
    scope: 'read',
    query: auditQuery,
    response: json(200, 'A page of entries.'),
  },
  {
    method: 'POST',
    path: '/api/reports',
    summary: 'Report a build, part, listing or message',
    tag: 'Review',
    auth: 'session',
    body: createReportInput,
    idempotent: true,
    response: json(201, 'The report.'),
    errors: [429],
  },
  // Admin
  {
    method: 'GET',
    path: '/api/admin/users',
    summary: 'Users (admins)',
    tag: 'Admin',
    auth: 'session-or-token',
    scope: 'read',
    query: listUsersQuery,
    response: json(200, 'A page of users.'),
  },
  {
    method: 'PATCH',
    path: '/api/admin/users/:userId/role',
    summary: "Change a user's role (admins)",
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    body: setRoleInput,
    response: json(200, 'The user.'),
  },
  {
    method: 'PATCH',
    path: '/api/admin/users/:userId/suspension',
    summary: 'Suspend or restore a user (admins)',
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    body: setSuspendedInput,
    response: json(200, 'The user.'),
  },
  {
    method: 'GET',
    path: '/api/admin/users/:userId/tokens',
    summary: "A user's rig tokens (admins; never their secrets)",
    description: 'Browser session only, like the account page: a token cannot list tokens.',
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    response: json(200, 'The tokens with created and last-used times.'),
  },
  {
    method: 'DELETE',
    path: '/api/admin/users/:userId/tokens/:tokenId',
    summary: "Revoke a user's rig token (admins)",
    description: 'For a leaked or misbehaving rig; the audit trail names the token and its owner.',
    tag: 'Admin',
    auth: 'session',
    params: userTokenParams,
    response: noContent('Revoked.'),
  },
  {
    method: 'GET',
    path: '/api/admin/outbox/given-up',
    summary: 'Mails the outbox gave up on (admins)',
    description: 'The newest 100 mails not sent after the last attempt, with the account they were for (a login, never an address).',
    tag: 'Admin',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The given-up mails and their total.'),
  },
  {
    method: 'POST',
    path: '/api/admin/outbox/:mailId/requeue',
    summary: 'Put a given-up mail back in the queue (admins)',
    tag: 'Admin',
    auth: 'session',
    params: mailIdParams,
    response: json(200, 'The mail, due now with its attempts from zero.'),
    errors: [409],
  },
  // Exchange
  {
    method: 'GET',
    path: '/api/listings',
    summary: 'Open listings (parts offered or wanted)',
    tag: 'Exchange',
    auth: 'visitor',
    query: listListingsQuery,
    response: json(200, 'A page of listings.'),
  },
  {
    method: 'GET',
    path: '/api/listings/mine',
    summary: 'My listings',
    tag: 'Exchange',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'My listings.'),
  },
  {
    method: 'POST',
    path: '/api/listings',
    summary: 'Offer or ask for a part',
    tag: 'Exchange',
    auth: 'session',
    body: createListingInput,
    idempotent: true,
    response: json(201, 'The listing.'),
  },
  {
    method: 'GET',
    path: '/api/listings/:listingId',
    summary: 'A listing',
    tag: 'Exchange',
    auth: 'visitor',
    params: listingIdParams,
    response: json(200, 'The listing.'),
  },
  {
    method: 'PATCH',
    path: '/api/listings/:listingId',
    summary: 'Edit a listing',
    tag: 'Exchange',
    auth: 'session',
    params: listingIdParams,
    body: updateListingInput,
    response: json(200, 'The listing.'),
  },
  {
    method: 'POST',
    path: '/api/listings/:listingId/visibility',
    summary: 'Hide or show a listing (moderators)',
    tag: 'Exchange',
    auth: 'session',
    params: listingIdParams,
    body: hideListingInput,
    response: json(200, 'The listing.'),
  },
  {
    method: 'POST',
    path: '/api/listings/:listingId/messages',
    summary: "Message a listing's owner",
    tag: 'Exchange',
    auth: 'session',
    params: listingIdParams,
    body: sendMessageInput,
    idempotent: true,
    response: json(201, 'The message and its thread.'),
    errors: [429],
  },
  {
    method: 'GET',
    path: '/api/inbox',
    summary: 'My message threads',
    tag: 'Exchange',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The threads.'),
  },
  {
    method: 'GET',
    path: '/api/inbox/:threadId',
    summary: 'A message thread',
    description: 'Reading changes nothing; `POST …/read` marks the other party’s messages read.',
    tag: 'Exchange',
    auth: 'session-or-token',
    scope: 'read',
    params: threadIdParams,
    response: json(200, 'The thread.'),
  },
  {
    method: 'POST',
    path: '/api/inbox/:threadId/read',
    summary: 'Mark a thread read',
    description: 'Marks the other party’s messages in the thread read (the inbox does this when it shows the thread).',
    tag: 'Exchange',
    auth: 'session',
    params: threadIdParams,
    response: noContent('Marked read.'),
  },
  {
    method: 'POST',
    path: '/api/inbox/:threadId/messages',
    summary: 'Reply in a thread',
    tag: 'Exchange',
    auth: 'session',
    params: threadIdParams,
    body: sendMessageInput,
    idempotent: true,
    response: json(201, 'The message.'),
    errors: [429],
  },
  ...attachedPhotoDocs('/api/listings', 'listingId', 'Exchange', 'listing', listingIdParams, listingPhotoParams),
  // Workbench
  ...workbenchDocs,
  imageHeightsDoc,
  ...shareDocs,
  ...commentDocs,
];

/** Tags in the order the document and the reference page list them, each with a line of its own. */
export const ROUTE_TAGS: ReadonlyArray<{ name: string; description: string }> = [
  { name: 'Actuators and runs', description: 'Actuators of a build and their calibration runs: what a rig posts.' },
  { name: 'Builds', description: 'Build logs: details, log entries and photos.' },
  { name: 'Parts registry', description: 'Salvaged parts with figures pooled from accepted runs.' },
  { name: 'Open data', description: 'The whole registry as files under the data licence.' },
  { name: 'Workbench', description: 'Pure calculations, open to anyone, nothing stored.' },
  { name: 'Account', description: 'My settings, the data licence and rig tokens.' },
  { name: 'Session', description: 'Signing in and out in a browser.' },
  { name: 'Exchange', description: 'Parts offered and wanted, and messages.' },
  { name: 'Review', description: 'Moderation: the queue, decisions, reports and the audit log.' },
  { name: 'Admin', description: 'User roles and suspensions.' },
  { name: 'Service', description: 'Health and this document.' },
];
