// One fixture per state-changing route: the rows the route acts on (owned by the case's maker),
// a valid body, a cheap read of what the route would change, and a check that a 2xx changed it.
// Used by the authorization matrix and the hostile-input properties.
import { randomBytes } from 'node:crypto';
import { expect } from 'vitest';
import type request from 'supertest';
import { CookieAccessInfo } from 'cookiejar';
import type { z } from 'zod';
import {
  createBuildInput,
  createEntryInput,
  reorderPhotosInput,
  updateBuildInput,
  updateEntryInput,
  updatePhotoInput,
} from '@shared/schemas/build.ts';
import { createActuatorInput, updateActuatorInput } from '@shared/schemas/actuator.ts';
import { driveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { createRunInput, updateRunInput } from '@shared/schemas/run.ts';
import { mergePartInput, proposePartInput } from '@shared/schemas/part.ts';
import {
  acceptRejectInput,
  accountSettingsInput,
  buildDecisionInput,
  createReportInput,
  reportDecisionInput,
} from '@shared/schemas/review.ts';
import { publishWithRunsInput } from '@shared/schemas/review-desk.ts';
import { createListingInput, hideListingInput, sendMessageInput, updateListingInput } from '@shared/schemas/listing.ts';
import { reorderAttachedPhotosInput, updateAttachedPhotoInput } from '@shared/schemas/attached-photo.ts';
import { setRoleInput, setSuspendedInput } from '@shared/schemas/user.ts';
import { OutboxMail } from '../../server/models/outbox-mail.model.ts';
import { MAX_ATTEMPTS } from '../../server/services/outbox.service.ts';
import { createApiTokenInput } from '@shared/schemas/api-token.ts';
import { encode as encodePng } from 'fast-png';
import * as wb from '@shared/schemas/workbench.ts';
import * as wbx from '@shared/schemas/workbench-extras.ts';
import { sineFitInput } from '@shared/schemas/sine-fit.ts';
import { lineariseInput, saveLinearisationInput } from '@shared/schemas/linearise.ts';
import { latticeInput } from '@shared/schemas/lattice.ts';
import type { TestApp } from './test-app.ts';
import type { Agent } from './login.ts';
import { fillPath, type RouteEntry } from './route-table.ts';
import { createActuatorRow, createBuildRow, createListingRow, createPart, createRunRow, createUser } from './factories.ts';
import { jpeg } from './images.ts';
import { signIn } from './login.ts';
import { User } from '../../server/models/user.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { BuildComment } from '../../server/models/build-comment.model.ts';
import { createCommentInput, hideCommentInput } from '@shared/schemas/comment.ts';
import { LogEntry } from '../../server/models/log-entry.model.ts';
import { Photo } from '../../server/models/photo.model.ts';
import { Actuator } from '../../server/models/actuator.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { Report } from '../../server/models/report.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Message, MessageThread } from '../../server/models/message.model.ts';
import { PartPhoto } from '../../server/models/part-photo.model.ts';
import { ListingPhoto } from '../../server/models/listing-photo.model.ts';
import { ApiToken } from '../../server/models/api-token.model.ts';
import { ReviewPost } from '../../server/models/review-post.model.ts';
import { Follow } from '../../server/models/follow.model.ts';
import { Notification } from '../../server/models/notification.model.ts';
import { unsubscribeLinks } from '../../server/services/mail-choices.service.ts';
import { createReviewPostInput } from '@shared/schemas/review-thread.ts';
import { markNotificationsReadInput } from '@shared/schemas/notification.ts';

/** Who sends the request: a signed-in user with their agent, or a visitor (user null). */
export interface Acting {
  user: User | null;
  agent: Agent;
}

export interface CaseContext {
  t: TestApp;
  /** The maker whose rows the route acts on ("maker (owner)"); for account routes, the account itself. */
  owner: User;
  actor: Acting;
}

export interface Target {
  params?: Record<string, number | string>;
  /** JSON body; absent for routes that take none. */
  body?: Record<string, unknown>;
  /** Multipart upload instead of JSON (photos, or one image in `field`). */
  multipart?: { files: Buffer[]; fields: Record<string, string>; field?: string; contentType?: string };
  /** A cheap read of everything the route could change: equal before and after a refusal. */
  state(): Promise<unknown>;
  /** After a 2xx: the change the route promises really happened. */
  changed(res: request.Response): Promise<void>;
}

export interface Fixture {
  /** The zod schema of the JSON body, for telling valid from invalid inputs in property tests. */
  schema?: z.ZodType;
  /** Who may do this when the fixture is made for the owner: used by tests that need one allowed actor. */
  allowed: 'owner' | 'other' | 'moderator' | 'admin';
  /** The route changes the owner's account (role, suspension): the owner must be a fresh user per case. */
  changesOwner?: boolean;
  /** The route ends the acting session (logout): every actor must be a fresh sign-in per case. */
  endsSession?: boolean;
  make(ctx: CaseContext): Promise<Target>;
}

const rows = async (...finds: Array<Promise<{ toJSON(): object } | { toJSON(): object }[] | null>>) =>
  (await Promise.all(finds)).map((r) => (Array.isArray(r) ? r.map((x) => x.toJSON()) : (r?.toJSON() ?? null)));
const unique = (prefix: string) => `${prefix} ${randomBytes(3).toString('hex')}`;

async function photoRow(buildId: number, ownerId: number, position: number) {
  const hash = randomBytes(32).toString('hex');
  return Photo.create({
    buildId,
    ownerId,
    contentHash: hash,
    displayFile: `${hash}.webp`,
    thumbFile: `${hash}-t.webp`,
    width: 40,
    height: 30,
    alt: 'A photo',
    position,
  });
}

async function attachedPhotoRow(model: typeof PartPhoto | typeof ListingPhoto, owner: { partId: number } | { listingId: number }) {
  const hash = randomBytes(32).toString('hex');
  return (model as typeof ListingPhoto).create({
    ...owner,
    contentHash: hash,
    displayFile: `${hash}.webp`,
    thumbFile: `${hash}-t.webp`,
    width: 40,
    height: 30,
    alt: 'A photo',
  } as never);
}

/** Fixtures for changing a part's or listing's stored photos (alt text, order), owned by the case's maker. */
function attachedPhotoEdit(subject: 'part' | 'listing', kind: 'alt' | 'order'): Fixture {
  const model = (subject === 'part' ? PartPhoto : ListingPhoto) as typeof ListingPhoto;
  return {
    schema: kind === 'alt' ? updateAttachedPhotoInput : reorderAttachedPhotosInput,
    allowed: 'owner',
    async make({ owner }) {
      const ownerKey: Record<string, number> =
        subject === 'part' ? { partId: (await createPart({ proposedById: owner.id })).id } : { listingId: (await listingRow(owner.id)).id };
      const [a, b] = [
        await attachedPhotoRow(model, ownerKey as { partId: number }),
        await attachedPhotoRow(model, ownerKey as { partId: number }),
      ];
      await b.update({ position: 1 });
      const photos = () =>
        model.findAll({
          where: ownerKey as never,
          order: [
            ['position', 'ASC'],
            ['id', 'ASC'],
          ],
        });
      const params: Record<string, number> = { ...ownerKey };
      return kind === 'alt'
        ? {
            params: { ...params, photoId: a.id },
            body: { alt: 'Markings readable under a loupe' },
            state: () => rows(photos()),
            async changed() {
              expect((await model.findByPk(a.id))?.alt).toBe('Markings readable under a loupe');
            },
          }
        : {
            params,
            body: { photoIds: [b.id, a.id] },
            state: () => rows(photos()),
            async changed() {
              expect((await photos()).map((p) => p.id)).toEqual([b.id, a.id]);
            },
          };
    },
  };
}

/** The agent's session cookie as a Cookie header value (null when it has none). */
export function sessionCookie(agent: Agent): string | null {
  const cookie = (agent as unknown as { jar: { getCookie(name: string, access: unknown): { value: string } | undefined } }).jar.getCookie(
    'scanwright.sid',
    CookieAccessInfo.All,
  );
  return cookie ? `scanwright.sid=${cookie.value}` : null;
}

/** The session id behind an agent's cookie (null when it has none). */
export function sidOf(agent: Agent): string | null {
  const cookie = sessionCookie(agent);
  if (!cookie) return null;
  const signed = decodeURIComponent(cookie.slice('scanwright.sid='.length)).slice(2);
  return signed.slice(0, signed.lastIndexOf('.'));
}

type Role = 'maker' | 'moderator' | 'admin';
export interface ActorPool {
  /** A new user of this role, signed in for real. */
  fresh(role: Role): Promise<Acting>;
  /** One signed-in user per kind, shared by every test of a file (signing in is the slow part). */
  shared(kind: 'owner' | 'other' | 'moderator' | 'admin'): Promise<Acting>;
}
export function actorPool(t: TestApp): ActorPool {
  const made = new Map<string, Promise<Acting>>();
  const fresh = async (role: Role) => {
    const user = await createUser({ role });
    return { user, agent: await signIn(t, user.login) };
  };
  return {
    fresh,
    shared: (kind) => {
      if (!made.has(kind)) made.set(kind, fresh(kind === 'owner' || kind === 'other' ? 'maker' : kind));
      return made.get(kind)!;
    },
  };
}

/**
 * The route's rows, made for the one actor allowed to act, so that a request which got through
 * would change them. Routes that end the session or change the owner's account get fresh users.
 */
export async function armed(t: TestApp, pool: ActorPool, route: RouteEntry): Promise<{ fixture: Fixture; target: Target; actor: Acting }> {
  const fixture = fixtures[route.key];
  if (!fixture) throw new Error(`no fixture for ${route.key}`);
  const owner = fixture.endsSession || fixture.changesOwner ? await pool.fresh('maker') : await pool.shared('owner');
  const actor = fixture.allowed === 'owner' ? owner : await pool.shared(fixture.allowed);
  return { fixture, actor, target: await fixture.make({ t, owner: owner.user!, actor }) };
}

export const sessionRows = async (t: TestApp, where: { sid?: string | null; userId?: number }) =>
  where.sid === null ? 0 : t.handle.sequelize.models.Session.count({ where: where as Record<string, unknown> });

/**
 * Send the fixture's request as the acting agent, with its CSRF token unless told otherwise.
 * `raw` replaces the body with these exact bytes (set the Content-Type in `headers`).
 */
export function send(
  route: RouteEntry,
  target: Target,
  agent: Agent,
  opts: { csrf?: string | null; raw?: string | Buffer; headers?: Record<string, string> } = {},
) {
  const method = route.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
  let req = agent[method](fillPath(route.path, target.params ?? {}));
  const csrf = opts.csrf === undefined ? agent.csrf : opts.csrf;
  if (csrf !== null) req = req.set('X-CSRF-Token', csrf);
  for (const [k, v] of Object.entries(opts.headers ?? {})) req = req.set(k, v);
  if (opts.raw !== undefined) return req.serialize((b: unknown) => b as string).send(opts.raw as string);
  if (target.multipart) {
    for (const [name, value] of Object.entries(target.multipart.fields)) req = req.field(name, value);
    for (const [i, file] of target.multipart.files.entries())
      req = req.attach(target.multipart.field ?? 'photos', file, {
        filename: `p${i}.${target.multipart.contentType === 'image/png' ? 'png' : 'jpg'}`,
        contentType: target.multipart.contentType ?? 'image/jpeg',
      });
    return req;
  }
  return target.body === undefined ? req : req.send(target.body);
}

const workbench = (schema: z.ZodType, body: Record<string, unknown>, answers: string): Fixture => ({
  schema,
  allowed: 'owner',
  async make() {
    return {
      body,
      state: async () => null,
      async changed(res) {
        expect(res.body).toHaveProperty(answers);
      },
    };
  },
});

async function draftBuild(ctx: CaseContext, status = 'draft') {
  return createBuildRow(ctx.owner.id, { status });
}

const buildState = (id: number) => () =>
  rows(
    Build.findByPk(id),
    LogEntry.findAll({ where: { buildId: id } }),
    Photo.findAll({ where: { buildId: id } }),
    Actuator.findAll({ where: { buildId: id } }),
  );

export const fixtures: Record<string, Fixture> = {
  'POST /auth/logout': {
    allowed: 'owner',
    endsSession: true,
    async make({ t, actor }) {
      const sid = sidOf(actor.agent);
      return {
        state: async () => sessionRows(t, { sid }),
        async changed() {
          expect(await sessionRows(t, { sid })).toBe(0);
          expect((await actor.agent.get('/api/session')).body.user).toBeNull();
        },
      };
    },
  },

  'PATCH /api/admin/users/:userId/role': {
    schema: setRoleInput,
    allowed: 'admin',
    changesOwner: true,
    async make({ owner }) {
      return {
        params: { userId: owner.id },
        body: { role: 'moderator' },
        state: () => rows(User.findByPk(owner.id)),
        async changed(res) {
          expect(res.body).toMatchObject({ id: owner.id, role: 'moderator' });
          expect((await User.findByPk(owner.id))?.role).toBe('moderator');
        },
      };
    },
  },
  'DELETE /api/admin/users/:userId/tokens/:tokenId': {
    allowed: 'admin',
    async make({ owner }) {
      const token = await ApiToken.create({
        userId: owner.id,
        name: unique('Leaked rig'),
        scopes: ['read'],
        tokenHash: randomBytes(32).toString('hex'),
      });
      return {
        params: { userId: owner.id, tokenId: token.id },
        state: () => rows(ApiToken.findByPk(token.id)),
        async changed() {
          expect(await ApiToken.findByPk(token.id)).toBeNull();
        },
      };
    },
  },
  'POST /api/admin/outbox/:mailId/requeue': {
    allowed: 'admin',
    async make() {
      // Given up: every attempt failed, the next one (never taken) far off.
      const mail = await OutboxMail.create({
        toAddress: `${unique('given-up').replace(' ', '-')}@example.org`,
        subject: 'Given up',
        textBody: 'x',
        htmlBody: '<p>x</p>',
        attempts: MAX_ATTEMPTS,
        nextAttemptAt: new Date(Date.now() + 86_400_000),
        lastError: 'Error: relay refused',
      });
      return {
        params: { mailId: mail.id },
        state: () => rows(OutboxMail.findByPk(mail.id)),
        async changed(res) {
          expect(res.body).toMatchObject({ id: mail.id, attempts: 0 });
          // Back in the queue: due now from zero attempts, or already sent by the worker.
          const row = await OutboxMail.findByPk(mail.id);
          expect(row!.sentAt !== null || (row!.attempts === 0 && row!.nextAttemptAt.getTime() <= Date.now())).toBe(true);
        },
      };
    },
  },
  'PATCH /api/admin/users/:userId/suspension': {
    schema: setSuspendedInput,
    allowed: 'admin',
    changesOwner: true,
    async make({ t, owner }) {
      return {
        params: { userId: owner.id },
        body: { suspended: true },
        state: () => rows(User.findByPk(owner.id)),
        async changed(res) {
          expect(res.body).toMatchObject({ id: owner.id, suspended: true });
          expect((await User.findByPk(owner.id))?.suspendedAt).not.toBeNull();
          expect(await sessionRows(t, { userId: owner.id })).toBe(0);
        },
      };
    },
  },

  'POST /api/workbench/fit': workbench(
    wb.fitInput,
    { points: [0, 1, 2, 3].map((v) => ({ volts: v, displacement: 0.1 * v })), displacementUnit: 'um' },
    'gainNmPerV',
  ),
  'POST /api/workbench/peak-to-peak': workbench(
    wb.peakToPeakInput,
    { displacementPpNm: 2000, voltsPpV: 20, displacementResolutionNm: 10 },
    'gainNmPerV',
  ),
  'POST /api/workbench/creep': workbench(
    wb.creepInput,
    { samples: [0.1, 1, 10, 100].map((timeS) => ({ timeS, displacementNm: 1000 * (1 + 0.02 * Math.log10(timeS / 0.1)) })) },
    'gamma',
  ),
  'POST /api/workbench/expected-gain': workbench(
    wb.expectedGainInput,
    { actuator: 'tube-quadrant', material: { d31PmPerV: -171 }, lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.5 },
    'gainNmPerV',
  ),
  'POST /api/workbench/mixing': workbench(
    wb.mixingInput,
    {
      gain: [
        [10, 1],
        [1, 10],
      ],
      limits: { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 },
    },
    'cautions',
  ),
  'POST /api/workbench/mixing-fit': workbench(
    wb.gainMatrixFitInput,
    {
      samples: [
        [0, 0],
        [1, 0],
        [0, 1],
        [1, 1],
        [2, 1],
      ].map(([vaV, vbV]) => ({ vaV, vbV, xNm: 10 * vaV + vbV, yNm: vaV + 10 * vbV })),
    },
    'gainNmPerV',
  ),
  'POST /api/workbench/scan-plan': workbench(
    wb.scanPlanInput,
    { dacBits: 16, dacSpanV: 10, ampGainVPerV: 15, actuatorGainNmPerV: 5, pixelsPerLine: 256, lines: 256, lineRateHz: 1 },
    'cautions',
  ),
  'POST /api/workbench/resonance': workbench(
    wb.resonanceInput,
    { lengthM: 450e-6, thicknessM: 2e-6, widthM: 50e-6, youngsModulusPa: 169e9, densityKgPerM3: 2330 },
    'firstModeHz',
  ),
  'POST /api/workbench/drive-current': workbench(
    wb.driveCurrentInput,
    { capacitanceF: 10e-9, amplitudeV: 100, frequencyHz: 1000 },
    'cautions',
  ),
  'POST /api/workbench/tunnelling': workbench(wb.tunnellingInput, { workFunctionEv: 4.5 }, 'decayConstantPerAngstrom'),
  'POST /api/workbench/convert': workbench(wb.unitConversionInput, { value: 1, from: 'nm', to: 'um' }, 'converted'),
  'POST /api/workbench/loaded-gain': workbench(
    wbx.loadedGainInput,
    { freeGainNmPerV: 102.6, actuatorStiffnessNPerM: 300, springRateNPerM: 150 },
    'loadedGainNmPerV',
  ),
  'POST /api/workbench/tube': workbench(
    wbx.tubeInput,
    { lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508, relPermittivity: 3400, youngsModulusPa: 60.6e9, densityKgPerM3: 7500 },
    'warnings',
  ),
  'POST /api/workbench/drive-limits': workbench(
    wbx.driveLimitsInput,
    { capacitanceF: 3.4e-9, amplitudeV: 100, frequencyHz: 1000 },
    'cautions',
  ),
  'POST /api/workbench/noise-floor': workbench(
    wbx.noiseFloorInput,
    { actuatorGainNmPerV: 102.6, dacBits: 16, dacSpanV: 10, ampGainVPerV: 30 },
    'warnings',
  ),
  'POST /api/workbench/linearise': workbench(
    lineariseInput,
    { points: [0, 10, 20, 30, 40].map((v) => ({ volts: v, displacement: 80 * v + 0.1 * v * v })), displacementUnit: 'nm', degree: 2 },
    'table',
  ),
  'POST /api/workbench/image-heights': {
    allowed: 'owner',
    async make() {
      const pixels = Uint16Array.from({ length: 32 * 32 }, (_, i) => (i % 32) * 1000);
      return {
        multipart: {
          files: [Buffer.from(encodePng({ width: 32, height: 32, data: pixels, depth: 16, channels: 1 }))],
          fields: {},
          field: 'image',
          contentType: 'image/png',
        },
        state: async () => null,
        async changed(res) {
          expect(res.body).toMatchObject({ width: 32, height: 32, bitDepth: 16 });
        },
      };
    },
  },
  'POST /api/workbench/lattice': workbench(
    latticeInput,
    {
      heights: Array.from({ length: 32 }, (_, r) =>
        Array.from({ length: 32 }, (_, c) => Math.cos((2 * Math.PI * c) / 4) + Math.cos((2 * Math.PI * r) / 4)),
      ),
      lattice: { kind: 'square', constantNm: 0.4 },
    },
    'nmPerPixel',
  ),
  'POST /api/workbench/sine-fit': workbench(
    sineFitInput,
    {
      samples: Array.from({ length: 100 }, (_, i) => ({
        timeS: i / 20,
        volts: 10 * Math.sin(i / 3),
        displacement: 500 * Math.sin(i / 3 - 0.2),
      })),
      displacementUnit: 'nm',
    },
    'gainNmPerV',
  ),

  'POST /api/builds/:buildId/photos': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      return {
        params: { buildId: build.id },
        multipart: { files: [await jpeg(40, 30)], fields: { alt: 'The scan head' } },
        state: buildState(build.id),
        async changed(res) {
          expect(res.status).toBe(201);
          expect(await Photo.count({ where: { buildId: build.id } })).toBe(1);
        },
      };
    },
  },
  'PUT /api/builds/:buildId/photos/order': {
    schema: reorderPhotosInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const [a, b] = [await photoRow(build.id, ctx.owner.id, 0), await photoRow(build.id, ctx.owner.id, 1)];
      return {
        params: { buildId: build.id },
        body: { photoIds: [b.id, a.id] },
        state: buildState(build.id),
        async changed() {
          expect((await Photo.findAll({ where: { buildId: build.id }, order: [['position', 'ASC']] })).map((p) => p.id)).toEqual([
            b.id,
            a.id,
          ]);
        },
      };
    },
  },
  'PATCH /api/builds/:buildId/photos/:photoId': {
    schema: updatePhotoInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const photo = await photoRow(build.id, ctx.owner.id, 0);
      return {
        params: { buildId: build.id, photoId: photo.id },
        body: { alt: 'The etched tip' },
        state: buildState(build.id),
        async changed() {
          expect((await Photo.findByPk(photo.id))?.alt).toBe('The etched tip');
        },
      };
    },
  },
  'DELETE /api/builds/:buildId/photos/:photoId': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const photo = await photoRow(build.id, ctx.owner.id, 0);
      return {
        params: { buildId: build.id, photoId: photo.id },
        state: buildState(build.id),
        async changed() {
          expect(await Photo.findByPk(photo.id)).toBeNull();
        },
      };
    },
  },
  'POST /api/builds/:buildId/photos/:photoId/cover': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const photo = await photoRow(build.id, ctx.owner.id, 0);
      return {
        params: { buildId: build.id, photoId: photo.id },
        state: buildState(build.id),
        async changed() {
          expect((await Build.findByPk(build.id))?.coverPhotoId).toBe(photo.id);
        },
      };
    },
  },

  'POST /api/builds': {
    schema: createBuildInput,
    allowed: 'owner',
    async make({ actor }) {
      const title = unique('Tube scanner');
      const mine = () => (actor.user ? Build.findAll({ where: { ownerId: actor.user.id, title } }) : Promise.resolve([]));
      return {
        body: { title, instrumentKind: 'tunnelling-microscope', summary: 'A tube-scanner STM.' },
        state: () => rows(mine()),
        async changed(res) {
          expect(res.body).toMatchObject({ title, status: 'draft', owner: { id: actor.user!.id } });
          expect(await mine()).toHaveLength(1);
        },
      };
    },
  },
  'PATCH /api/builds/:buildId': {
    schema: updateBuildInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      return {
        params: { buildId: build.id },
        body: { title: 'Renamed build' },
        state: buildState(build.id),
        async changed() {
          expect((await Build.findByPk(build.id))?.title).toBe('Renamed build');
        },
      };
    },
  },
  'DELETE /api/builds/:buildId': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      return {
        params: { buildId: build.id },
        state: buildState(build.id),
        async changed() {
          expect(await Build.findByPk(build.id)).toBeNull();
        },
      };
    },
  },
  'POST /api/builds/:buildId/submit': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      return {
        params: { buildId: build.id },
        state: buildState(build.id),
        async changed() {
          expect((await Build.findByPk(build.id))?.status).toBe('submitted');
        },
      };
    },
  },
  'POST /api/builds/:buildId/withdraw': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx, 'submitted');
      return {
        params: { buildId: build.id },
        state: buildState(build.id),
        async changed() {
          expect((await Build.findByPk(build.id))?.status).toBe('draft');
        },
      };
    },
  },
  'POST /api/builds/:buildId/entries': {
    schema: createEntryInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      return {
        params: { buildId: build.id },
        body: { entryDate: '2026-01-10', title: 'First light', body: 'Saw the graphite lattice.' },
        state: buildState(build.id),
        async changed() {
          expect((await LogEntry.findAll({ where: { buildId: build.id } })).map((e) => e.title)).toEqual(['First light']);
        },
      };
    },
  },
  'PATCH /api/builds/:buildId/entries/:entryId': {
    schema: updateEntryInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const entry = await LogEntry.create({ buildId: build.id, entryDate: '2026-01-10', title: 'First light', body: 'x' });
      return {
        params: { buildId: build.id, entryId: entry.id },
        body: { title: 'Second light' },
        state: buildState(build.id),
        async changed() {
          expect((await LogEntry.findByPk(entry.id))?.title).toBe('Second light');
        },
      };
    },
  },
  'DELETE /api/builds/:buildId/entries/:entryId': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const entry = await LogEntry.create({ buildId: build.id, entryDate: '2026-01-10', title: 'First light', body: 'x' });
      return {
        params: { buildId: build.id, entryId: entry.id },
        state: buildState(build.id),
        async changed() {
          expect(await LogEntry.findByPk(entry.id)).toBeNull();
        },
      };
    },
  },

  'POST /api/builds/:buildId/actuators': {
    schema: createActuatorInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      return {
        params: { buildId: build.id },
        body: { partId: part.id, axis: 'Z', drive: 'single' },
        state: buildState(build.id),
        async changed() {
          expect(await Actuator.count({ where: { buildId: build.id, partId: part.id } })).toBe(1);
        },
      };
    },
  },
  'PATCH /api/actuators/:actuatorId': {
    schema: updateActuatorInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
      return {
        params: { actuatorId: actuator.id },
        body: { label: 'Z tube' },
        state: buildState(build.id),
        async changed() {
          expect((await Actuator.findByPk(actuator.id))?.label).toBe('Z tube');
        },
      };
    },
  },
  'DELETE /api/actuators/:actuatorId': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
      return {
        params: { actuatorId: actuator.id },
        state: buildState(build.id),
        async changed() {
          expect(await Actuator.findByPk(actuator.id)).toBeNull();
        },
      };
    },
  },
  'PUT /api/actuators/:actuatorId/drive-matrix': {
    schema: driveMatrixInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id, axis: 'XY', drive: 'pair-anti-phase' });
      return {
        params: { actuatorId: actuator.id },
        body: {
          gainNmPerV: [
            [70, -70],
            [70, 70],
          ],
          limits: { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 },
        },
        state: buildState(build.id),
        async changed() {
          expect(JSON.parse((await Actuator.findByPk(actuator.id))?.driveMatrixJson ?? 'null')).toMatchObject({
            gainNmPerV: [
              [70, -70],
              [70, 70],
            ],
          });
        },
      };
    },
  },
  'PUT /api/actuators/:actuatorId/linearisation': {
    schema: saveLinearisationInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
      return {
        params: { actuatorId: actuator.id },
        body: {
          points: [0, 10, 20, 30, 40].map((v) => ({ volts: v, displacement: 80 * v + 0.1 * v * v })),
          displacementUnit: 'nm',
          degree: 2,
        },
        state: buildState(build.id),
        async changed() {
          expect(JSON.parse((await Actuator.findByPk(actuator.id))?.linearisationJson ?? 'null')).toMatchObject({
            result: { branches: { all: { degree: 2 } } },
          });
        },
      };
    },
  },
  'DELETE /api/actuators/:actuatorId/linearisation': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
      const { linearise } = await import('../../shared/workbench/linearise.ts');
      const result = linearise({
        points: [0, 10, 20, 30].map((v) => ({ volts: v, displacement: 80 * v })),
        voltageUnit: 'V',
        displacementUnit: 'nm',
        degree: 1,
      });
      await actuator.update({ linearisationJson: JSON.stringify({ result, measuredOn: null, savedAt: '2026-12-01T00:00:00.000Z' }) });
      return {
        params: { actuatorId: actuator.id },
        state: buildState(build.id),
        async changed() {
          expect((await Actuator.findByPk(actuator.id))?.linearisationJson).toBeNull();
        },
      };
    },
  },
  'DELETE /api/actuators/:actuatorId/drive-matrix': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const saved = {
        gainNmPerV: [
          [70, -70],
          [70, 70],
        ],
        offsetNm: [0, 0],
        limits: { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 },
        model: 'origin',
        measuredOn: null,
        savedAt: '2026-12-01T00:00:00.000Z',
      };
      const actuator = await Actuator.create({
        buildId: build.id,
        partId: part.id,
        label: null,
        axis: 'XY',
        drive: 'pair-anti-phase',
        amplifier: null,
        maxVolts: null,
        notes: null,
        driveMatrixJson: JSON.stringify(saved),
      });
      return {
        params: { actuatorId: actuator.id },
        state: buildState(build.id),
        async changed() {
          expect((await Actuator.findByPk(actuator.id))?.driveMatrixJson).toBeNull();
        },
      };
    },
  },
  'POST /api/actuators/:actuatorId/runs': {
    schema: createRunInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
      const runs = () => CalibrationRun.findAll({ where: { actuatorId: actuator.id } });
      return {
        params: { actuatorId: actuator.id },
        body: { points: [0, 10, 20, 30].map((v) => ({ volts: v, displacement: 4.2 * v })), displacementUnit: 'nm', method: 'indicator' },
        state: () => rows(runs(), Build.findByPk(build.id)),
        async changed() {
          expect((await runs()).map((r) => [r.status, Number(r.gainNmPerV.toFixed(6))])).toEqual([['pending', 4.2]]);
        },
      };
    },
  },
  'PATCH /api/runs/:runId': {
    schema: updateRunInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const run = await createRunRow({ buildId: build.id, partId: part.id, ownerId: ctx.owner.id, gainNmPerV: 40 });
      return {
        params: { runId: run.id },
        body: { measuredOn: '2026-11-02', notes: 'Re-read the indicator.' },
        state: () => rows(CalibrationRun.findByPk(run.id)),
        async changed() {
          expect(await CalibrationRun.findByPk(run.id)).toMatchObject({ measuredOn: '2026-11-02', notes: 'Re-read the indicator.' });
        },
      };
    },
  },
  'DELETE /api/runs/:runId': {
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx);
      const part = await createPart();
      const run = await createRunRow({ buildId: build.id, partId: part.id, ownerId: ctx.owner.id, gainNmPerV: 40 });
      return {
        params: { runId: run.id },
        state: () => rows(CalibrationRun.findByPk(run.id)),
        async changed() {
          expect(await CalibrationRun.findByPk(run.id)).toBeNull();
        },
      };
    },
  },

  'POST /api/parts': {
    schema: proposePartInput,
    allowed: 'owner',
    async make({ actor }) {
      const name = unique('Buzzer disc');
      const mine = () => Part.findAll({ where: { name } });
      return {
        body: { category: 'buzzer-disc', name, salvageSource: 'a doorbell' },
        state: () => rows(mine()),
        async changed() {
          expect((await mine()).map((p) => [p.status, p.proposedById])).toEqual([['proposed', actor.user!.id]]);
        },
      };
    },
  },
  'POST /api/parts/:partId/merge': {
    schema: mergePartInput,
    allowed: 'moderator',
    async make({ owner }) {
      const from = await createPart({ proposedById: owner.id });
      const into = await createPart();
      return {
        params: { partId: from.id },
        body: { intoPartId: into.id, note: 'Same bar, two names.' },
        state: () => rows(Part.findByPk(from.id), Part.findByPk(into.id)),
        async changed() {
          expect((await Part.findByPk(from.id))?.mergedIntoId).toBe(into.id);
        },
      };
    },
  },

  'POST /api/parts/:partId/photos': {
    allowed: 'owner',
    async make({ owner }) {
      const part = await createPart({ proposedById: owner.id });
      const photos = () => PartPhoto.findAll({ where: { partId: part.id } });
      return {
        params: { partId: part.id },
        multipart: { files: [await jpeg(40, 30)], fields: { alt: 'The bar beside a ruler' } },
        state: () => rows(photos()),
        async changed(res) {
          expect(res.status).toBe(201);
          expect((await photos()).map((p) => p.alt)).toEqual(['The bar beside a ruler']);
        },
      };
    },
  },
  'PUT /api/parts/:partId/photos/order': attachedPhotoEdit('part', 'order'),
  'PATCH /api/parts/:partId/photos/:photoId': attachedPhotoEdit('part', 'alt'),
  'DELETE /api/parts/:partId/photos/:photoId': {
    allowed: 'owner',
    async make({ owner }) {
      const part = await createPart({ proposedById: owner.id });
      const photo = await attachedPhotoRow(PartPhoto, { partId: part.id });
      return {
        params: { partId: part.id, photoId: photo.id },
        state: () => rows(PartPhoto.findAll({ where: { partId: part.id } })),
        async changed() {
          expect(await PartPhoto.findByPk(photo.id)).toBeNull();
        },
      };
    },
  },

  'POST /api/review/builds/:id/decision': {
    schema: buildDecisionInput,
    allowed: 'moderator',
    async make(ctx) {
      const build = await draftBuild(ctx, 'submitted');
      return {
        params: { id: build.id },
        body: { decision: 'publish' },
        state: buildState(build.id),
        async changed() {
          expect((await Build.findByPk(build.id))?.status).toBe('published');
        },
      };
    },
  },
  'POST /api/review/builds/:buildId/publish-with-runs': {
    schema: publishWithRunsInput,
    allowed: 'moderator',
    async make(ctx) {
      const build = await draftBuild(ctx, 'submitted');
      const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: ctx.owner.id, gainNmPerV: 40 });
      return {
        params: { buildId: build.id },
        body: { acceptRunIds: [run.id] },
        state: () => rows(Build.findByPk(build.id), CalibrationRun.findByPk(run.id)),
        async changed() {
          expect((await Build.findByPk(build.id))?.status).toBe('published');
          expect((await CalibrationRun.findByPk(run.id))?.status).toBe('accepted');
        },
      };
    },
  },
  'POST /api/review/runs/:id/decision': {
    schema: acceptRejectInput,
    allowed: 'moderator',
    async make(ctx) {
      const build = await draftBuild(ctx, 'published');
      const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: ctx.owner.id, gainNmPerV: 40 });
      return {
        params: { id: run.id },
        body: { decision: 'accept' },
        state: () => rows(CalibrationRun.findByPk(run.id)),
        async changed() {
          expect((await CalibrationRun.findByPk(run.id))?.status).toBe('accepted');
        },
      };
    },
  },
  'POST /api/review/parts/:id/decision': {
    schema: acceptRejectInput,
    allowed: 'moderator',
    async make({ owner }) {
      const part = await createPart({ status: 'proposed', proposedById: owner.id });
      return {
        params: { id: part.id },
        body: { decision: 'accept' },
        state: () => rows(Part.findByPk(part.id)),
        async changed() {
          expect((await Part.findByPk(part.id))?.status).toBe('accepted');
        },
      };
    },
  },
  'POST /api/review/reports/:id/decision': {
    schema: reportDecisionInput,
    allowed: 'moderator',
    async make(ctx) {
      const build = await draftBuild(ctx, 'published');
      const report = await Report.create({ reporterId: ctx.owner.id, targetType: 'build', targetId: build.id, reason: 'spam', note: null });
      return {
        params: { id: report.id },
        body: { decision: 'dismiss', note: 'Not spam.' },
        state: () => rows(Report.findByPk(report.id)),
        async changed() {
          expect((await Report.findByPk(report.id))?.status).toBe('dismissed');
        },
      };
    },
  },
  'POST /api/reports': {
    schema: createReportInput,
    allowed: 'owner',
    async make(ctx) {
      const build = await draftBuild(ctx, 'published');
      const reports = () => Report.findAll({ where: { targetType: 'build', targetId: build.id } });
      return {
        body: { targetType: 'build', targetId: build.id, reason: 'wrong-data', note: 'The gain is off by 1000.' },
        state: () => rows(reports()),
        async changed() {
          expect((await reports()).map((r) => [r.reporterId, r.status])).toEqual([[ctx.actor.user!.id, 'open']]);
        },
      };
    },
  },
  'PATCH /api/account/settings': {
    schema: accountSettingsInput,
    allowed: 'owner',
    async make({ actor }) {
      return {
        body: { mailOptOut: true },
        state: () => rows(actor.user ? User.findByPk(actor.user.id) : Promise.resolve(null)),
        async changed(res) {
          expect(res.body).toMatchObject({ mailOptOut: true });
          expect((await User.findByPk(actor.user!.id))?.mailOptOut).toBe(true);
        },
      };
    },
  },

  'POST /api/account/data-licence': {
    allowed: 'owner',
    async make({ actor }) {
      return {
        state: () => rows(actor.user ? User.findByPk(actor.user.id) : Promise.resolve(null)),
        async changed(res) {
          expect(res.body.acceptedAt).toEqual(expect.any(String));
          expect((await User.findByPk(actor.user!.id))?.dataLicenceAcceptedAt).toBeInstanceOf(Date);
        },
      };
    },
  },
  'POST /api/account/tokens': {
    schema: createApiTokenInput,
    allowed: 'owner',
    async make({ actor }) {
      const name = unique('Rig');
      const mine = () => ApiToken.findAll({ where: { name } });
      return {
        body: { name, scopes: ['runs:write'] },
        state: () => rows(mine()),
        async changed(res) {
          expect(res.body.token).toMatch(/^swt_/);
          expect((await mine()).map((tk) => [tk.userId, tk.scopes])).toEqual([[actor.user!.id, ['runs:write']]]);
        },
      };
    },
  },
  'DELETE /api/account/tokens/:tokenId': {
    allowed: 'owner',
    async make({ owner }) {
      const token = await ApiToken.create({
        userId: owner.id,
        name: unique('Rig'),
        scopes: ['read'],
        tokenHash: randomBytes(32).toString('hex'),
      });
      return {
        params: { tokenId: token.id },
        state: () => rows(ApiToken.findByPk(token.id)),
        async changed() {
          expect(await ApiToken.findByPk(token.id)).toBeNull();
        },
      };
    },
  },
  'POST /api/listings': {
    schema: createListingInput,
    allowed: 'owner',
    async make({ actor }) {
      const part = await createPart();
      const listings = () => Listing.findAll({ where: { partId: part.id } });
      return {
        body: { partId: part.id, kind: 'offering', quantity: 2, condition: 'salvaged-tested', priceKind: 'free', region: 'Lower Saxony' },
        state: () => rows(listings()),
        async changed() {
          expect((await listings()).map((l) => l.ownerId)).toEqual([actor.user!.id]);
        },
      };
    },
  },
  'PATCH /api/listings/:listingId': {
    schema: updateListingInput,
    allowed: 'owner',
    async make({ owner }) {
      const listing = await listingRow(owner.id);
      return {
        params: { listingId: listing.id },
        body: { quantity: 5 },
        state: () => rows(Listing.findByPk(listing.id)),
        async changed() {
          expect((await Listing.findByPk(listing.id))?.quantity).toBe(5);
        },
      };
    },
  },
  'POST /api/listings/:listingId/photos': {
    allowed: 'owner',
    async make({ owner }) {
      const listing = await listingRow(owner.id);
      const photos = () => ListingPhoto.findAll({ where: { listingId: listing.id } });
      return {
        params: { listingId: listing.id },
        multipart: { files: [await jpeg(40, 30)], fields: { alt: 'Three discs in a tray' } },
        state: () => rows(photos()),
        async changed(res) {
          expect(res.status).toBe(201);
          expect((await photos()).map((p) => p.alt)).toEqual(['Three discs in a tray']);
        },
      };
    },
  },
  'PUT /api/listings/:listingId/photos/order': attachedPhotoEdit('listing', 'order'),
  'PATCH /api/listings/:listingId/photos/:photoId': attachedPhotoEdit('listing', 'alt'),
  'DELETE /api/listings/:listingId/photos/:photoId': {
    allowed: 'owner',
    async make({ owner }) {
      const listing = await listingRow(owner.id);
      const photo = await attachedPhotoRow(ListingPhoto, { listingId: listing.id });
      return {
        params: { listingId: listing.id, photoId: photo.id },
        state: () => rows(ListingPhoto.findAll({ where: { listingId: listing.id } })),
        async changed() {
          expect(await ListingPhoto.findByPk(photo.id)).toBeNull();
        },
      };
    },
  },
  'POST /api/listings/:listingId/visibility': {
    schema: hideListingInput,
    allowed: 'moderator',
    async make({ owner }) {
      const listing = await listingRow(owner.id);
      return {
        params: { listingId: listing.id },
        body: { hidden: true, note: 'Mains-powered gear without cautions.' },
        state: () => rows(Listing.findByPk(listing.id)),
        async changed() {
          expect((await Listing.findByPk(listing.id))?.hiddenAt).not.toBeNull();
        },
      };
    },
  },
  'POST /api/builds/:buildId/comments': {
    schema: createCommentInput,
    allowed: 'other',
    async make({ owner, actor }) {
      const build = await createBuildRow(owner.id, { status: 'published' });
      const comments = () => BuildComment.findAll({ where: { buildId: build.id } });
      return {
        params: { buildId: build.id },
        body: { body: 'Which **clamp** holds the bar?' },
        state: () => rows(comments()),
        async changed(res) {
          expect((await comments()).map((c) => [c.authorId, c.body])).toEqual([[actor.user!.id, 'Which **clamp** holds the bar?']]);
          expect(res.body).toMatchObject({ buildId: build.id, body: 'Which **clamp** holds the bar?' });
        },
      };
    },
  },
  'POST /api/comments/:commentId/hide': {
    schema: hideCommentInput,
    allowed: 'moderator',
    async make({ owner }) {
      const build = await createBuildRow(owner.id, { status: 'published' });
      const comment = await BuildComment.create({ buildId: build.id, authorId: owner.id, body: 'Buy cheap bars at my shop' });
      return {
        params: { commentId: comment.id },
        body: { note: 'Advertising.' },
        state: () => rows(BuildComment.findByPk(comment.id)),
        async changed() {
          expect((await BuildComment.findByPk(comment.id))?.hiddenAt).not.toBeNull();
        },
      };
    },
  },
  'POST /api/listings/:listingId/messages': {
    schema: sendMessageInput,
    allowed: 'other',
    async make({ owner, actor }) {
      const listing = await listingRow(owner.id);
      const threads = () => MessageThread.findAll({ where: { listingId: listing.id } });
      return {
        params: { listingId: listing.id },
        body: { body: 'Are the bars still available?' },
        state: () => rows(threads()),
        async changed(res) {
          expect((await threads()).map((th) => th.starterId)).toEqual([actor.user!.id]);
          expect((await Message.findAll({ where: { threadId: res.body.threadId } })).map((m) => m.body)).toEqual([
            'Are the bars still available?',
          ]);
        },
      };
    },
  },
  'POST /api/inbox/:threadId/read': {
    allowed: 'owner',
    async make({ owner }) {
      const listing = await listingRow(owner.id);
      const starter = await createUser();
      const thread = await MessageThread.create({
        listingId: listing.id,
        starterId: starter.id,
        ownerId: owner.id,
        lastMessageAt: new Date(),
      });
      const message = await Message.create({ threadId: thread.id, senderId: starter.id, body: 'Still there?' });
      return {
        params: { threadId: thread.id },
        state: () => rows(Message.findByPk(message.id)),
        async changed() {
          expect((await Message.findByPk(message.id))?.readAt).not.toBeNull();
        },
      };
    },
  },
  'POST /api/inbox/:threadId/messages': {
    schema: sendMessageInput,
    allowed: 'owner',
    async make({ owner, actor }) {
      const listing = await listingRow(owner.id);
      const starter = await createUser();
      const thread = await MessageThread.create({
        listingId: listing.id,
        starterId: starter.id,
        ownerId: owner.id,
        lastMessageAt: new Date(),
      });
      await Message.create({ threadId: thread.id, senderId: starter.id, body: 'Still there?' });
      const messages = () => Message.findAll({ where: { threadId: thread.id }, order: [['id', 'ASC']] });
      return {
        params: { threadId: thread.id },
        body: { body: 'Yes, two left.' },
        state: () => rows(messages()),
        async changed() {
          expect((await messages()).map((m) => [m.senderId, m.body])).toEqual([
            [starter.id, 'Still there?'],
            [actor.user!.id, 'Yes, two left.'],
          ]);
        },
      };
    },
  },
  'POST /api/builds/:buildId/review-thread': {
    schema: createReviewPostInput,
    allowed: 'owner',
    async make({ owner }) {
      const build = await createBuildRow(owner.id, { status: 'returned' });
      const posts = () => ReviewPost.findAll({ where: { buildId: build.id } });
      return {
        params: { buildId: build.id },
        body: { body: 'Clamped at 3 mm now; see the new runs.' },
        state: () => rows(posts()),
        async changed(res) {
          expect((await posts()).map((p) => p.body)).toEqual(['Clamped at 3 mm now; see the new runs.']);
          expect(res.body).toMatchObject({ type: 'post', body: 'Clamped at 3 mm now; see the new runs.' });
        },
      };
    },
  },
  'PUT /api/follows/:targetType/:targetId': {
    allowed: 'other',
    async make({ owner }) {
      const build = await createBuildRow(owner.id, { status: 'published' });
      const follows = () => Follow.findAll({ where: { targetType: 'build', targetId: build.id } });
      return {
        params: { targetType: 'build', targetId: build.id },
        state: () => rows(follows()),
        async changed(res) {
          expect((await follows()).length).toBe(1);
          expect(res.body).toMatchObject({ following: true, followers: 1 });
        },
      };
    },
  },
  'DELETE /api/follows/:targetType/:targetId': {
    allowed: 'other',
    async make({ owner, actor }) {
      const build = await createBuildRow(owner.id, { status: 'published' });
      await Follow.create({ userId: actor.user?.id ?? owner.id, targetType: 'build', targetId: build.id });
      const follows = () => Follow.findAll({ where: { targetType: 'build', targetId: build.id } });
      return {
        params: { targetType: 'build', targetId: build.id },
        state: () => rows(follows()),
        async changed() {
          expect(await follows()).toEqual([]);
        },
      };
    },
  },
  'POST /api/notifications/read': {
    schema: markNotificationsReadInput,
    allowed: 'owner',
    async make({ owner, actor }) {
      const n = await Notification.create({
        userId: actor.user?.id ?? owner.id,
        kind: 'comment',
        text: 'A question on your build',
        path: '/builds/1',
      });
      return {
        params: {},
        body: { ids: [n.id] },
        state: () => rows(Notification.findByPk(n.id)),
        async changed(res) {
          expect((await Notification.findByPk(n.id))?.readAt).not.toBeNull();
          expect(res.body).toEqual({ unread: expect.any(Number) });
        },
      };
    },
  },
  // The signed link is the credential: anyone holding it unsubscribes its person (no session, no CSRF token).
  'POST /api/mail/unsubscribe/:userId/:kind/:token': {
    allowed: 'owner',
    async make() {
      const who = await createUser();
      const link = (await unsubscribeLinks(who.id, 'comments'))!;
      const [userId, kind, token] = link.oneClick.split('/').slice(-3);
      return {
        params: { userId: userId!, kind: kind!, token: token! },
        state: () => rows(User.findByPk(who.id, { attributes: ['id', 'mailOff'] })),
        async changed(res) {
          expect((await User.findByPk(who.id))?.mailOff).toBe('comments');
          expect(res.body).toEqual({ kind: 'comments', title: expect.any(String), on: false });
        },
      };
    },
  },
};

const listingRow = (ownerId: number) => createListingRow(ownerId);
