// The one way services write: a Sequelize transaction that is run again, whole, when MariaDB (or a
// Galera node) refuses it for a reason a second attempt can cure. On Galera a certification conflict
// with a write committed on another node arrives as a deadlock (1213), often at COMMIT; a node that has
// left the primary component answers 1047 until it has rejoined. Both undo the whole transaction, so
// running the function again from its start is safe as long as it has no side effects outside the
// database (mail goes through the outbox table; files are written before and pruned after).
import type { Sequelize, Transaction } from 'sequelize';

/** ER_LOCK_DEADLOCK: an InnoDB deadlock, or a Galera certification failure (the transaction was rolled back). */
const ER_LOCK_DEADLOCK = 1213;
/** ER_UNKNOWN_COM_ERROR as Galera uses it: "WSREP has not yet prepared node for application use". */
const ER_WSREP_NOT_READY = 1047;
const RETRYABLE = new Set([ER_LOCK_DEADLOCK, ER_WSREP_NOT_READY]);

export interface RetryPolicy {
  /** Attempts in all, the first included. */
  attempts: number;
  /** Backoff cap of the first retry, in ms; doubles for each further one. */
  baseMs: number;
  /** No single wait is longer than this, in ms. */
  capMs: number;
}

export const WRITE_RETRY: RetryPolicy = { attempts: 4, baseMs: 20, capMs: 500 };

/** The MariaDB errno behind a Sequelize error (its `parent`/`original`), or a driver error itself. */
export function mariadbErrno(err: unknown): number | undefined {
  for (let e: unknown = err, depth = 0; e && typeof e === 'object' && depth < 4; depth++) {
    const { errno } = e as { errno?: unknown };
    if (typeof errno === 'number') return errno;
    const next = e as { parent?: unknown; original?: unknown; cause?: unknown };
    e = next.parent ?? next.original ?? next.cause;
  }
  return undefined;
}

export const isRetryableWriteError = (err: unknown): boolean => RETRYABLE.has(mariadbErrno(err) ?? 0);

/**
 * Wait before retry number `retry` (1 for the first retry): "full jitter", a uniform draw from
 * [0, min(cap, base · 2^(retry−1))). Source: Marc Brooker, "Exponential Backoff And Jitter", AWS
 * Architecture Blog, 4 March 2015 — full jitter spreads competing clients best for the least total work.
 */
export function backoffMs(retry: number, policy: RetryPolicy = WRITE_RETRY, random: () => number = Math.random): number {
  const ceiling = Math.min(policy.capMs, policy.baseMs * 2 ** (retry - 1));
  return Math.floor(random() * ceiling);
}

export interface WriteTransactionOptions {
  policy?: RetryPolicy;
  /** Called before each retry (tests count them; the logger could note them). */
  onRetry?: (retry: number, err: unknown) => void;
}

/**
 * Run `work` in a transaction and commit; on a deadlock, certification failure or WSREP-not-ready
 * error run it again (at most `attempts` in all) after a jittered backoff, then give up and rethrow.
 */
export async function withWriteTransaction<T>(
  sequelize: Sequelize,
  work: (transaction: Transaction) => Promise<T>,
  options: WriteTransactionOptions = {},
): Promise<T> {
  const policy = options.policy ?? WRITE_RETRY;
  for (let attempt = 1; ; attempt++) {
    try {
      return await sequelize.transaction(work);
    } catch (err) {
      if (attempt >= policy.attempts || !isRetryableWriteError(err)) throw err;
      options.onRetry?.(attempt, err);
      await new Promise((resolve) => setTimeout(resolve, backoffMs(attempt, policy)));
    }
  }
}
