import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { quantileSorted, summarize } from '../../shared/stats/quantiles.ts';

describe('quantileSorted (Hyndman & Fan type 7)', () => {
  // Worked values of R's quantile(x, type = 7) for x = 1..10 [S: Hyndman & Fan 1996, definition 7;
  // h = (n−1)p + 1 in 1-based terms]: p25 = 1 + 9·0.25 = 3.25, p75 = 7.75, median 5.5.
  test('when x = 1..10, then p25 3.25, median 5.5, p75 7.75 [calc from S: Hyndman & Fan 1996]', () => {
    const x = Array.from({ length: 10 }, (_, i) => i + 1);
    expect(quantileSorted(x, 0.25)).toBeCloseTo(3.25, 12);
    expect(quantileSorted(x, 0.5)).toBeCloseTo(5.5, 12);
    expect(quantileSorted(x, 0.75)).toBeCloseTo(7.75, 12);
  });

  test('when one value, then every quantile is that value; when none, null', () => {
    expect(quantileSorted([42], 0.25)).toBe(42);
    expect(quantileSorted([], 0.5)).toBeNull();
  });

  // Independent computation: the textbook definition by counting — for type 7 the quantile q at p
  // satisfies q = (1−g)·x[j] + g·x[j+1] with j = floor((n−1)p); checked against a brute-force
  // piecewise-linear interpolation of the empirical points ((k)/(n−1), x[k]).
  test('when values are random, then it equals linear interpolation of the points (k/(n−1), x_k)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 2, maxLength: 60 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (xs, p) => {
          const s = xs.slice().sort((a, b) => a - b);
          const n = s.length;
          let expected = s[n - 1]!;
          for (let k = 0; k < n - 1; k++) {
            const a = k / (n - 1);
            const b = (k + 1) / (n - 1);
            if (p >= a && p <= b) {
              expected = s[k]! + ((p - a) / (b - a)) * (s[k + 1]! - s[k]!);
              break;
            }
          }
          expect(quantileSorted(s, p)!).toBeCloseTo(expected, 6);
        },
      ),
    );
  });

  test('when summarizing, then min, quartiles, median and max come from the sorted finite values', () => {
    expect(summarize([9, 1, 5, Number.NaN, 3, 7])).toEqual({ n: 5, min: 1, p25: 3, median: 5, p75: 7, max: 9 });
  });
});
