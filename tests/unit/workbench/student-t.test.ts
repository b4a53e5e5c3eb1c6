import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lnGamma, normalQuantile, studentTQuantile, studentTTwoSidedTail, tCritical95 } from '@shared/workbench/student-t.ts';

// Composite Simpson rule, independent of the incomplete-beta code under test.
function simpson(f: (x: number) => number, a: number, b: number, intervals: number): number {
  const h = (b - a) / intervals;
  let sum = f(a) + f(b);
  for (let i = 1; i < intervals; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

function tDensity(df: number): (t: number) => number {
  const c = Math.exp(lnGamma((df + 1) / 2) - lnGamma(df / 2)) / Math.sqrt(df * Math.PI);
  return (t) => c * (1 + (t * t) / df) ** (-(df + 1) / 2);
}

describe('tCritical95', () => {
  // [S: NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.2 "Critical values of the Student's t
  // distribution", column 0.025 (upper tail)] — printed to 3 decimals, so compared to ±0.0005.
  it.each([
    [1, 12.706],
    [2, 4.303],
    [3, 3.182],
    [4, 2.776],
    [5, 2.571],
    [10, 2.228],
    [15, 2.131],
    [20, 2.086],
    [29, 2.045],
    [30, 2.042],
    [40, 2.021],
    [60, 2.0],
    [100, 1.984],
    [Infinity, 1.96],
  ])('when df = %s, then t(0.975) is the NIST table value %s', (df, printed) => {
    expect(tCritical95(df)).toBeCloseTo(printed, 3);
  });

  it('when df = 1 or 2, then it equals the closed forms tan(π(p − ½)) and (2p − 1)/√(2p(1 − p)) [calc]', () => {
    expect(tCritical95(1)).toBeCloseTo(Math.tan(Math.PI * 0.475), 12);
    expect(tCritical95(2)).toBeCloseTo(0.95 / Math.sqrt(2 * 0.975 * 0.025), 12);
  });

  it.each([3, 4, 7, 10, 30, 100, 250])(
    'when df = %i, then the density integrates to 0.475 between 0 and t(0.975) [calc: Simpson quadrature]',
    (df) => {
      expect(simpson(tDensity(df), 0, tCritical95(df), 20000)).toBeCloseTo(0.475, 11);
    },
  );

  it('when df = ∞, then the normal density integrates to 0.475 between 0 and z(0.975) [calc]', () => {
    const phi = (z: number) => Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
    expect(simpson(phi, 0, tCritical95(Infinity), 20000)).toBeCloseTo(0.475, 12);
  });

  it('when df > 1000 (Cornish–Fisher branch, A&S 26.7.5), then the incomplete-beta tail at t is 0.05 [calc]', () => {
    for (const df of [1001, 2000, 20000]) expect(studentTTwoSidedTail(tCritical95(df), df)).toBeCloseTo(0.05, 12);
  });

  it('when df grows, then t(0.975) decreases towards z(0.975) [calc]', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e5, noNaN: true }), fc.double({ min: 1e-3, max: 100, noNaN: true }), (df, step) => {
        expect(tCritical95(df + step)).toBeLessThan(tCritical95(df));
        expect(tCritical95(df + step)).toBeGreaterThan(normalQuantile(0.975));
      }),
    );
  });
});

describe('studentTQuantile and normalQuantile', () => {
  it('when p < 0.5, then the quantile is the negative of the upper one (symmetry) [calc]', () => {
    expect(studentTQuantile(0.025, 7)).toBeCloseTo(-studentTQuantile(0.975, 7), 13);
    expect(normalQuantile(0.1)).toBeCloseTo(-normalQuantile(0.9), 13);
    expect(studentTQuantile(0.5, 3)).toBe(0);
  });

  it('when a one-sided table entry is asked, then it matches [S: NIST/SEMATECH e-Handbook 1.3.6.7.2]', () => {
    expect(studentTQuantile(0.95, 10)).toBeCloseTo(1.812, 3);
    expect(studentTQuantile(0.999, 3)).toBeCloseTo(10.215, 3);
    expect(normalQuantile(0.995)).toBeCloseTo(2.576, 3);
  });

  it('when inputs are out of range, then it throws', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(RangeError);
    expect(() => studentTQuantile(0.975, 0.5)).toThrow(RangeError);
    expect(() => normalQuantile(0)).toThrow(RangeError);
  });
});

describe('lnGamma (Lanczos) [calc]', () => {
  it('when x is a half-integer or integer, then it matches ln √π and ln (n − 1)!', () => {
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 14);
    expect(lnGamma(1)).toBeCloseTo(0, 14);
    expect(lnGamma(10)).toBeCloseTo(Math.log(362880), 13);
    expect(lnGamma(1.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI) / 2), 14);
  });
});
