import { describe, expect, test } from 'vitest';
import {
  matchUnitSlip,
  modifiedZScore,
  medianAbsoluteDeviation,
  plausibilityFlags,
  POOR_FIT_R2,
  FEW_POINTS,
  LARGE_HYSTERESIS_PCT,
} from '../../shared/review/plausibility.ts';

const clean = { n: 18, gainNmPerV: 100, r2: 0.999, hysteresisPctFs: 6 };
const accepted = [96, 100, 104, 98, 102];
const codes = (f: { code: string }[]) => f.map((x) => x.code);

describe('matchUnitSlip', () => {
  test('when the ratio lies between 2 and 2√2, then the nearer factor is named, and 2.42 (outside both ±12 % bands) is no slip [calc]', () => {
    expect(matchUnitSlip(2.1)?.label).toBe('2');
    expect(matchUnitSlip(2.75)?.label).toBe('2√2');
    expect(matchUnitSlip(2.42)).toBeNull();
    expect(matchUnitSlip(0.1)?.label).toBe('1/10');
    expect(matchUnitSlip(1.3)).toBeNull();
  });
});

describe('plausibility flags', () => {
  test('when a run is clean and close to its part, then no flag fires', () => {
    expect(plausibilityFlags(clean, accepted, 105)).toEqual([]);
  });

  test.each([
    ['poor-fit', { ...clean, r2: POOR_FIT_R2 - 0.01 }],
    ['few-points', { ...clean, n: FEW_POINTS - 1 }],
    ['large-hysteresis', { ...clean, hysteresisPctFs: LARGE_HYSTERESIS_PCT + 1 }],
  ])('when the run is crafted for %s, then exactly that flag fires', (code, run) => {
    expect(codes(plausibilityFlags(run, accepted, 105))).toEqual([code]);
  });

  test('when the gain is far from the accepted runs, then outlier fires', () => {
    expect(codes(plausibilityFlags({ ...clean, gainNmPerV: 160 }, accepted, null))).toEqual(['outlier']);
  });

  test.each([25.4, 1000, 1 / 25.4, 1 / 1000, 10, 1 / 10, 2, 1 / 2, 2 * Math.SQRT2, 1 / (2 * Math.SQRT2)])(
    'when the gain is the part median × %d (a unit slip), then unit-slip fires instead of outlier [practice; 25.4 exact per NBS 1959, 2√2 = p-p ÷ rms of a sine, calc]',
    (factor) => {
      expect(codes(plausibilityFlags({ ...clean, gainNmPerV: 100 * factor }, accepted, null))).toEqual(['unit-slip']);
    },
  );

  test('when measured ÷ expected is outside 0.25–2, then expected-mismatch fires; inside, it stays quiet', () => {
    expect(codes(plausibilityFlags(clean, [], 30))).toEqual(['expected-mismatch']);
    expect(codes(plausibilityFlags(clean, [], 500))).toEqual(['expected-mismatch']);
    expect(plausibilityFlags(clean, [], 120)).toEqual([]);
  });

  test('when fewer than 3 accepted runs exist, then no outlier verdict is given', () => {
    expect(plausibilityFlags({ ...clean, gainNmPerV: 500 }, [100, 101], null)).toEqual([]);
  });
});

describe('modified z-score [S: Iglewicz & Hoaglin 1993]', () => {
  // Worked by hand: sample 96,98,100,102,104 → median 100, |dev| 4,2,0,2,4 → MAD 2;
  // M(110) = 0.6745·10/2 = 3.3725 [calc].
  test('when x = 110 in 96..104, then M = 3.3725', () => {
    expect(medianAbsoluteDeviation(accepted)).toBe(2);
    expect(modifiedZScore(110, accepted)).toBeCloseTo(3.3725, 10);
  });
  test('when the MAD is zero, then no score', () => {
    expect(modifiedZScore(5, [1, 1, 1, 1])).toBeNull();
  });
});
