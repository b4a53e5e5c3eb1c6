import { createHash } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { pathMatches } from '@shared/auth/path-pattern.ts';
import { AppError, ConflictError } from '../errors.ts';
import { claimIdempotencyKey, releaseIdempotencyKey, storeIdempotentAnswer } from '../services/idempotency.service.ts';
import { idempotencyScope } from '../services/idempotency-context.ts';
import { routePath } from './route-path.ts';

/**
 * POSTs that create something, so that a retry after a lost answer would make it twice. Token
 * creation is left out on purpose: replaying it would mean keeping the secret.
 */
const IDEMPOTENT_POSTS: readonly string[] = [
  '/api/actuators/:actuatorId/runs',
  '/api/builds',
  '/api/builds/:buildId/entries',
  '/api/builds/:buildId/actuators',
  '/api/parts',
  '/api/reports',
  '/api/listings',
  '/api/listings/:listingId/messages',
  '/api/inbox/:threadId/messages',
  // Photo uploads add rows for every request. Their multipart body is read later by the route, so the
  // comparison covers its length (a retry of the same files keeps it; multipart boundaries have a fixed length).
  '/api/builds/:buildId/photos',
  '/api/parts/:partId/photos',
  '/api/listings/:listingId/photos',
];

/** 1–255 visible ASCII characters (no spaces or control characters). */
const KEY_SHAPE = /^[\x21-\x7e]{1,255}$/;

/** JSON with object keys sorted at every level, so key order does not make two bodies differ. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

const isSuccess = (status: number) => status >= 200 && status < 300;

/** Store a 2xx answer before it is sent (so a quick retry finds it), release the key on anything else. */
function recordAnswer(req: Request, res: Response, id: number): void {
  let settled = false;
  const log = (err: unknown) => req.log?.error({ err }, 'idempotency key bookkeeping failed');
  const sendJson = res.json.bind(res);
  res.json = (body: unknown) => {
    if (settled) return sendJson(body);
    settled = true;
    const status = res.statusCode;
    const work = isSuccess(status) ? storeIdempotentAnswer(id, status, JSON.stringify(body)) : releaseIdempotencyKey(id);
    work
      .catch(async (err: unknown) => {
        log(err);
        await releaseIdempotencyKey(id).catch(log);
      })
      .finally(() => sendJson(body));
    return res;
  };
  // Answers sent without res.json (an empty 2xx), or a client that hung up before any answer.
  res.on('finish', () => {
    if (settled) return;
    settled = true;
    (isSuccess(res.statusCode) ? storeIdempotentAnswer(id, res.statusCode, '') : releaseIdempotencyKey(id)).catch(log);
  });
  res.on('close', () => {
    if (settled) return;
    settled = true;
    releaseIdempotencyKey(id).catch(log);
  });
}

/**
 * `Idempotency-Key` on the POSTs listed above: the same user, key, method, path and body within 24 h
 * gets the first 2xx answer again (`Idempotent-Replayed: true`) and nothing is created twice; the key
 * with another request is 409 `idempotency_key_reused`, a retry while the first still runs 409
 * `idempotency_in_progress`. Keys are per user; visitors are left to the route's 401.
 */
export const idempotency: RequestHandler = async (req, res, next) => {
  if (req.method !== 'POST' || !IDEMPOTENT_POSTS.some((p) => pathMatches(p, routePath(req)))) return next();
  const key = req.get('idempotency-key');
  const userId = (req.user as { id?: number } | undefined)?.id;
  if (key === undefined || userId === undefined) return next();
  if (!KEY_SHAPE.test(key)) {
    throw new AppError(400, 'invalid_idempotency_key', 'The Idempotency-Key header must be 1–255 visible ASCII characters (no spaces).');
  }
  const multipart = req.is('multipart/form-data') ? `multipart:${req.get('content-length') ?? ''}` : null;
  const bodyHash = createHash('sha256')
    .update(multipart ?? canonicalJson(req.body ?? {}))
    .digest('hex');
  const claim = await claimIdempotencyKey({ userId, key, method: req.method, path: routePath(req), bodyHash });
  switch (claim.kind) {
    case 'run':
      recordAnswer(req, res, claim.id);
      return idempotencyScope(claim.id, () => next());
    case 'applied':
      throw new AppError(
        409,
        'idempotency_already_applied',
        `The first request with this Idempotency-Key was stored (${claim.resource.replace(':', ' ')}) but its answer was lost; ` +
          'read it back instead of sending it again.',
        { resource: claim.resource },
      );
    case 'replay':
      res.status(claim.status).set('Idempotent-Replayed', 'true');
      if (claim.body) res.type('application/json').send(claim.body);
      else res.end();
      return;
    case 'reused':
      throw new ConflictError('This Idempotency-Key was already used for a different request; use a new key.', 'idempotency_key_reused');
    case 'in-progress':
      throw new ConflictError(
        'A request with this Idempotency-Key is still being processed; retry in a moment.',
        'idempotency_in_progress',
      );
  }
};
