// An express-rate-limit store that keeps its counts in MariaDB, so every app instance on one database shares each
// limit (RATE_LIMIT_STORE=mariadb, as `npm run cluster` sets). Fixed windows like the memory store: the first hit of a
// client opens a window of `windowMs`; hits inside it add up; the first hit after it opens a new one.
import { createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { RateLimitCounter } from '../models/rate-limit-counter.model.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';

/** Expired rows are swept now and then (every this many increments in this process), a bounded batch at a time. */
const SWEEP_EVERY = 500;
const SWEEP_BATCH = 1000;
let incrementsSinceSweep = 0;

const sequelize = () => RateLimitCounter.sequelize!;

export class MariaDbRateLimitStore implements Store {
  private windowMs = 60_000;
  /** Counts are kept outside this process. */
  readonly localKeys = false;

  /** `prefix` names the limiter, so two limiters never share a count for the same client. */
  constructor(readonly prefix: string) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private rowKey(key: string): string {
    return createHash('sha256').update(`${this.prefix}\u0000${key}`).digest('hex');
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await sequelize().query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_counters WHERE counter_key = ? AND reset_at > NOW(3)',
      { replacements: [this.rowKey(key)], type: QueryTypes.SELECT },
    );
    return row ? { totalHits: Number(row.hits), resetTime: new Date(row.reset_at) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const counterKey = this.rowKey(key);
    const windowUs = Math.round(this.windowMs * 1000);
    // One upsert and the read of its result in one transaction: the row lock makes the pair atomic on one server, and
    // on a Galera cluster a certification conflict with another node's increment is retried by the write wrapper.
    // In ON DUPLICATE KEY UPDATE, assignments run left to right: `hits` is decided on the old `reset_at`, which is
    // then moved on only when it had passed.
    const row = await withWriteTransaction(sequelize(), async (transaction) => {
      await sequelize().query(
        `INSERT INTO rate_limit_counters (counter_key, hits, reset_at) VALUES (?, 1, NOW(3) + INTERVAL ? MICROSECOND)
         ON DUPLICATE KEY UPDATE hits = IF(reset_at <= NOW(3), 1, hits + 1),
                                 reset_at = IF(reset_at <= NOW(3), NOW(3) + INTERVAL ? MICROSECOND, reset_at)`,
        { replacements: [counterKey, windowUs, windowUs], transaction },
      );
      const [current] = await sequelize().query<{ hits: number; reset_at: Date }>(
        'SELECT hits, reset_at FROM rate_limit_counters WHERE counter_key = ?',
        { replacements: [counterKey], type: QueryTypes.SELECT, transaction },
      );
      return current!;
    });
    if (++incrementsSinceSweep >= SWEEP_EVERY) {
      incrementsSinceSweep = 0;
      void sequelize()
        .query(`DELETE FROM rate_limit_counters WHERE reset_at < NOW(3) LIMIT ${SWEEP_BATCH}`)
        .catch(() => undefined);
    }
    return { totalHits: Number(row.hits), resetTime: new Date(row.reset_at) };
  }

  async decrement(key: string): Promise<void> {
    await sequelize().query('UPDATE rate_limit_counters SET hits = GREATEST(hits, 1) - 1 WHERE counter_key = ?', {
      replacements: [this.rowKey(key)],
    });
  }

  async resetKey(key: string): Promise<void> {
    await sequelize().query('DELETE FROM rate_limit_counters WHERE counter_key = ?', { replacements: [this.rowKey(key)] });
  }
}
