import { Op, UniqueConstraintError } from 'sequelize';
import { IdempotencyKey } from '../models/idempotency-key.model.ts';

/** How long a first answer is replayed. */
const KEEP_MS = 24 * 60 * 60 * 1000;
/** A first request still marked running after this long died with its process; its key may be used again. */
const ABANDONED_AFTER_MS = 5 * 60 * 1000;
/** A committed first request normally stores its answer within this time; later, its answer was lost. */
const APPLIED_GRACE_MS = 10_000;
/** Expired rows are deleted at most this often per process, in batches. */
const PRUNE_EVERY_MS = 60_000;
let lastPrune = 0;

export interface IdempotentRequest {
  userId: number;
  key: string;
  method: string;
  path: string;
  bodyHash: string;
}

/** What to do with a request: run it (and store its answer under `id`), replay a stored answer, or refuse. */
export type IdempotencyClaim =
  | { kind: 'run'; id: number }
  | { kind: 'replay'; status: number; body: string }
  | { kind: 'reused' }
  | { kind: 'in-progress' }
  | { kind: 'applied'; resource: string };

async function pruneExpired(now: number): Promise<void> {
  if (now - lastPrune < PRUNE_EVERY_MS) return;
  lastPrune = now;
  await IdempotencyKey.destroy({ where: { expiresAt: { [Op.lt]: new Date(now) } }, limit: 1000 });
}

/**
 * Claim a user's key for this request. The unique (user, key) row decides races: whoever inserts it
 * runs the request; everyone else gets the stored answer, or 409 when the first is still running or
 * the key was used for another request.
 */
export async function claimIdempotencyKey(req: IdempotentRequest): Promise<IdempotencyClaim> {
  const now = Date.now();
  await pruneExpired(now);
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const row = await IdempotencyKey.create({
        userId: req.userId,
        idemKey: req.key,
        method: req.method,
        path: req.path,
        bodyHash: req.bodyHash,
        expiresAt: new Date(now + KEEP_MS),
      });
      return { kind: 'run', id: row.id };
    } catch (err) {
      if (!(err instanceof UniqueConstraintError)) throw err;
    }
    const row = await IdempotencyKey.findOne({ where: { userId: req.userId, idemKey: req.key } });
    if (!row) continue;
    // A first request that died after committing its write (no answer stored) is done, never run again.
    const abandoned = row.responseStatus === null && row.appliedResource === null && now - row.createdAt.getTime() > ABANDONED_AFTER_MS;
    if (row.expiresAt.getTime() <= now || abandoned) {
      await IdempotencyKey.destroy({ where: { id: row.id } });
      continue;
    }
    if (row.method !== req.method || row.path !== req.path || row.bodyHash !== req.bodyHash) return { kind: 'reused' };
    if (row.responseStatus === null && row.appliedResource !== null && now - row.createdAt.getTime() > APPLIED_GRACE_MS)
      return { kind: 'applied', resource: row.appliedResource };
    if (row.responseStatus === null) return { kind: 'in-progress' };
    return { kind: 'replay', status: row.responseStatus, body: row.responseBody ?? '' };
  }
  return { kind: 'in-progress' };
}

/** Keep the first request's 2xx answer for replay. */
export async function storeIdempotentAnswer(id: number, status: number, body: string): Promise<void> {
  await IdempotencyKey.update({ responseStatus: status, responseBody: body }, { where: { id } });
}

/** Forget a claim whose request failed, so the client may retry with the same key (never one whose write committed). */
export async function releaseIdempotencyKey(id: number): Promise<void> {
  await IdempotencyKey.destroy({ where: { id, responseStatus: null, appliedResource: null } });
}
