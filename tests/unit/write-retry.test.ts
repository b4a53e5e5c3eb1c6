// The write retry's rules: which errors it retries and how long it waits. Backoff shape from Marc Brooker,
// "Exponential Backoff And Jitter", AWS Architecture Blog, 2015 [S]: full jitter draws uniformly from
// [0, min(cap, base · 2^n)). Error numbers from the MariaDB Server error codes reference [S: mariadb.com/kb].
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { backoffMs, isRetryableWriteError, mariadbErrno, WRITE_RETRY } from '../../server/db/write-transaction.ts';

const wrapped = (code: string, errno: number) => ({ name: 'SequelizeDatabaseError', parent: { code, errno }, original: { code, errno } });

describe('backoffMs', () => {
  test('when the draw is at its top, then each retry waits just under base · 2^(n−1), never above the cap [calc]', () => {
    const top = () => 0.999999;
    const policy = { attempts: 10, baseMs: 20, capMs: 500 };
    // 20 · 2^0 = 20, 40, 80, 160, 320, then the 500 ms cap.
    expect([1, 2, 3, 4, 5, 6, 7].map((n) => backoffMs(n, policy, top))).toEqual([19, 39, 79, 159, 319, 499, 499]);
  });

  test('when the draw is zero, then the wait is zero (full jitter starts at nothing) [calc]', () => {
    expect(backoffMs(3, WRITE_RETRY, () => 0)).toBe(0);
  });

  test('when drawn many times with Math.random, then every wait lies in [0, ceiling) and they spread over it', () => {
    const waits = Array.from({ length: 2000 }, () => backoffMs(3, WRITE_RETRY));
    const ceiling = Math.min(WRITE_RETRY.capMs, WRITE_RETRY.baseMs * 4);
    expect(Math.min(...waits)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...waits)).toBeLessThan(ceiling);
    // Uniform on [0, 80): the lower and upper halves each hold about half the draws.
    const low = waits.filter((w) => w < ceiling / 2).length;
    expect(low).toBeGreaterThan(800);
    expect(low).toBeLessThan(1200);
  });

  test('the policy retries a bounded number of times and its total worst-case wait stays under two seconds [calc]', () => {
    let worst = 0;
    for (let n = 1; n < WRITE_RETRY.attempts; n++) worst += Math.min(WRITE_RETRY.capMs, WRITE_RETRY.baseMs * 2 ** (n - 1));
    expect(WRITE_RETRY.attempts).toBe(4);
    expect(worst).toBeLessThan(2000);
  });
});

describe('isRetryableWriteError', () => {
  test.each([
    ['a deadlock or Galera certification failure (1213)', wrapped('ER_LOCK_DEADLOCK', 1213), true],
    ['a node not ready for application use (1047)', wrapped('ER_UNKNOWN_COM_ERROR', 1047), true],
    ['a bare driver error carrying 1213', { errno: 1213 }, true],
    ['a duplicate key (1062)', wrapped('ER_DUP_ENTRY', 1062), false],
    ['a lock wait timeout (1205)', wrapped('ER_LOCK_WAIT_TIMEOUT', 1205), false],
    ['an error of our own', new Error('not found'), false],
    ['nothing at all', undefined, false],
  ])('when %s, then retryable is %s', (_what, err, expected) => {
    expect(isRetryableWriteError(err)).toBe(expected);
  });

  test('when the errno sits on a cause chain, then it is found', () => {
    expect(mariadbErrno({ cause: { parent: { errno: 1213 } } })).toBe(1213);
  });
});

// Galera replicates no table locks: LOCK TABLES is not supported across the cluster (MariaDB Galera Cluster
// known limitations [S: mariadb.com/kb, "MariaDB Galera Cluster - Known Limitations"]).
test('no server, shared or script code issues LOCK TABLES', () => {
  const offenders: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (/\.(ts|mjs|js)$/.test(name) && /\bLOCK\s+TABLES?\b/i.test(readFileSync(path, 'utf8'))) offenders.push(path);
    }
  };
  for (const dir of ['server', 'shared', 'scripts']) walk(dir);
  expect(offenders).toEqual([]);
});
