import fc from 'fast-check';
import { linearRegression, linearRegressionLine, rSquared } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import {
  fitCalibration,
  fitCalibrationColumns,
  fitCalibrationInUnits,
  toFitResultDto,
  type CalibrationPoint,
} from '@shared/workbench/calibration-fit.ts';
import { FitInputError, MAX_FIT_POINTS } from '@shared/workbench/fit-input-error.ts';
import { tCritical95 } from '@shared/workbench/student-t.ts';
import { readStrdFile, type StrdDataset } from '../../support/nist-strd.ts';
import { seededRandom } from '../../../shared/stats/seeded-random.ts';

const fixture = (name: string): StrdDataset => readStrdFile(new URL(`../../fixtures/${name}.dat`, import.meta.url));
const toPoints = (d: StrdDataset): CalibrationPoint[] => d.x.map((volts, i) => ({ volts, displacementNm: d.y[i] }));

function expectRelative(actual: number | null, expected: number, rel: number): void {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe('fitCalibration against NIST StRD certified values [S: NIST/ITL Statistical Reference Datasets]', () => {
  it('when fitting Norris with an intercept, then every certified value matches to 1e-10', () => {
    const data = fixture('Norris');
    expect(data.model).toBe('intercept');
    expect(data.x).toHaveLength(36);
    const fit = fitCalibration(toPoints(data), 'intercept');
    const c = data.certified;
    expectRelative(fit.gainNmPerV, c.slope, 1e-10);
    expectRelative(fit.gainStdErrNmPerV, c.slopeSd, 1e-10);
    expectRelative(fit.interceptNm, c.intercept as number, 1e-10);
    expectRelative(fit.interceptStdErrNm, c.interceptSd as number, 1e-10);
    expectRelative(fit.residualStdNm, c.residualSd, 1e-10);
    expectRelative(fit.r2, c.r2, 1e-10);
    expectRelative(fit.residualSumSquaresNm2, c.residualSumSquares as number, 1e-10);
    expect(fit.df).toBe(34);
  });

  it.each(['NoInt1', 'NoInt2'])('when fitting %s through the origin, then every certified value matches to 1e-10', (name) => {
    const data = fixture(name);
    expect(data.model).toBe('origin');
    const fit = fitCalibration(toPoints(data), 'origin');
    const c = data.certified;
    expectRelative(fit.gainNmPerV, c.slope, 1e-10);
    expectRelative(fit.gainStdErrNmPerV, c.slopeSd, 1e-10);
    expectRelative(fit.residualStdNm, c.residualSd, 1e-10);
    expectRelative(fit.r2, c.r2, 1e-10); // uncentred R², NIST's no-intercept convention
    expectRelative(fit.residualSumSquaresNm2, c.residualSumSquares as number, 1e-10);
    expect(fit.interceptNm).toBe(0);
    expect(fit.df).toBe(data.x.length - 1);
  });
});

describe('fitCalibration against simple-statistics (npm) on seeded random data [calc: second reference, FIELD.md "Calibration fit"]', () => {
  it.each([1, 2, 3, 4, 5])('when seed %i, then slope, intercept, R² and residual SD agree to 1e-9', (seed) => {
    const rand = seededRandom(seed);
    const n = 20 + Math.floor(rand() * 200);
    const gain = (rand() - 0.5) * 400;
    const offset = (rand() - 0.5) * 1000;
    const pairs: [number, number][] = [];
    for (let i = 0; i < n; i++) {
      const v = (rand() - 0.3) * 150;
      pairs.push([v, offset + gain * v + (rand() - 0.5) * 50]);
    }
    const reference = linearRegression(pairs);
    const line = linearRegressionLine(reference);
    const sse = pairs.reduce((sum, [v, x]) => sum + (x - line(v)) ** 2, 0);
    const fit = fitCalibration(
      pairs.map(([volts, displacementNm]) => ({ volts, displacementNm })),
      'intercept',
    );
    expectRelative(fit.gainNmPerV, reference.m, 1e-9);
    expectRelative(fit.interceptNm, reference.b, 1e-9);
    expectRelative(fit.r2, rSquared(pairs, line), 1e-9);
    expectRelative(fit.residualStdNm, Math.sqrt(sse / (n - 2)), 1e-9);
  });
});

describe('fitCalibration properties', () => {
  const voltsArb = fc.uniqueArray(fc.integer({ min: -3000, max: 3000 }), { minLength: 3, maxLength: 40 });
  const coefficient = fc.double({ min: -500, max: 500, noNaN: true }).filter((g) => Math.abs(g) > 1e-3);

  it('when the points lie exactly on a line, then the intercept model returns it [calc]', () => {
    fc.assert(
      fc.property(voltsArb, coefficient, fc.double({ min: -1e4, max: 1e4, noNaN: true }), (levels, gain, offset) => {
        const points = levels.map((l) => ({ volts: l / 10, displacementNm: offset + gain * (l / 10) }));
        const fit = fitCalibration(points, 'intercept');
        const scale = Math.abs(offset) + Math.abs(gain) * 300;
        expect(Math.abs(fit.gainNmPerV - gain)).toBeLessThan(1e-9 * (Math.abs(gain) + scale / 300));
        expect(Math.abs(fit.interceptNm - offset)).toBeLessThan(1e-9 * scale);
        expect(fit.residualStdNm).toBeLessThan(1e-9 * scale);
      }),
    );
  });

  it('when the points lie exactly on a line through the origin, then the origin model returns it [calc]', () => {
    fc.assert(
      fc.property(voltsArb, coefficient, (levels, gain) => {
        const points = levels.map((l) => ({ volts: l / 10, displacementNm: gain * (l / 10) }));
        const fit = fitCalibration(points, 'origin');
        expect(Math.abs(fit.gainNmPerV - gain)).toBeLessThan(1e-12 * Math.abs(gain) + 1e-12);
        expect(fit.interceptNm).toBe(0);
      }),
    );
  });
});

describe('fitCalibration worked examples [calc]', () => {
  // (0,0), (1,1), (2,3): b = 3/2, a = −1/6, residuals 1/6, −1/3, 1/6, SSE = 1/6, Syy = 42/9.
  const points = [
    { volts: 0, displacementNm: 0 },
    { volts: 1, displacementNm: 1 },
    { volts: 2, displacementNm: 3 },
  ];

  it(
    'when three points are fitted, then gain, SE, CI, R², span and nonlinearity match hand values (one sweep: ' +
      'nonlinearity is max |residual| ÷ span [S: ISA-51.1 terms — memory for the clause])',
    () => {
      const fit = fitCalibration(points, 'intercept', { includeResiduals: true });
      expect(fit.gainNmPerV).toBeCloseTo(1.5, 14);
      expect(fit.interceptNm).toBeCloseTo(-1 / 6, 14);
      expect(fit.residualStdNm).toBeCloseTo(Math.sqrt(1 / 6), 14);
      expect(fit.gainStdErrNmPerV).toBeCloseTo(Math.sqrt(1 / 6) / Math.SQRT2, 14);
      const half = tCritical95(1) * (Math.sqrt(1 / 6) / Math.SQRT2);
      expect(fit.gainCi95NmPerV[0]).toBeCloseTo(1.5 - half, 12);
      expect(fit.gainCi95NmPerV[1]).toBeCloseTo(1.5 + half, 12);
      expect(fit.r2).toBeCloseTo(27 / 28, 14);
      expect(fit.spanNm).toBeCloseTo(3, 14);
      expect(fit.nonlinearityPctFs).toBeCloseTo((1 / 3 / 3) * 100, 12);
      expect(fit.residualsNm?.map((r) => Number(r.toFixed(12)))).toEqual([0.166666666667, -0.333333333333, 0.166666666667]);
      expect(fit.hysteresisPctFs).toBeNull();
      expect(fit.lineNm[0]).toBeCloseTo(-1 / 6, 14);
      expect(fit.lineNm[1]).toBeCloseTo(3 - 1 / 6, 14);
    },
  );

  it('when up and down sweeps share voltages, then hysteresis is the largest gap of sweep means over the span [practice]', () => {
    // up: (0,0) (1,10) (1,12) (2,20) (3,30 up only); down: (2,20) (1,15) (0,2)
    const loop: CalibrationPoint[] = [
      { volts: 0, displacementNm: 0, sweep: 'up' },
      { volts: 1, displacementNm: 10, sweep: 'up' },
      { volts: 1, displacementNm: 12, sweep: 'up' },
      { volts: 2, displacementNm: 20, sweep: 'up' },
      { volts: 3, displacementNm: 30, sweep: 'up' },
      { volts: 2, displacementNm: 20, sweep: 'down' },
      { volts: 1, displacementNm: 15, sweep: 'down' },
      { volts: 0, displacementNm: 2, sweep: 'down' },
    ];
    const fit = fitCalibration(loop, 'intercept');
    // gaps: V=0 |0 − 2| = 2, V=1 |11 − 15| = 4, V=2 0; V=3 is in one sweep only.
    expect(fit.hysteresisPctFs).toBeCloseTo((4 / fit.spanNm) * 100, 12);
    expect(fit.spanNm).toBeCloseTo(Math.abs(fit.gainNmPerV) * 3, 12);
  });

  it(
    'when a perfectly linear part shows a symmetric loop, then nonlinearity is 0 while hysteresis is the loop width ' +
      '[S: ISA-51.1 independent linearity on the calibration curve — memory for the clause]',
    () => {
      // Up reads 10·V + 2·sin(π·V/4) on 0…4 V, down 10·V − 2·sin(π·V/4): the average is exactly 10·V.
      const loop: CalibrationPoint[] = [];
      for (const v of [0, 1, 2, 3, 4]) loop.push({ volts: v, displacementNm: 10 * v + 2 * Math.sin((Math.PI * v) / 4), sweep: 'up' });
      for (const v of [4, 3, 2, 1, 0]) loop.push({ volts: v, displacementNm: 10 * v - 2 * Math.sin((Math.PI * v) / 4), sweep: 'down' });
      const fit = fitCalibration(loop, 'intercept');
      expect(fit.gainNmPerV).toBeCloseTo(10, 12);
      expect(fit.nonlinearityPctFs).toBeCloseTo(0, 10);
      expect(fit.hysteresisPctFs).toBeCloseTo((4 / 40) * 100, 10); // widest gap 2·2 at 2 V over a 40 nm span [calc]
    },
  );

  it('when the calibration curve bows, then nonlinearity is the largest gap between the sweep-averaged curve and the line over the span [calc]', () => {
    // Up (0,0) (1,12) (2,20); down (2,20) (1,8) (0,0): the curve is (0,0) (1,10) (2,20), the line through all
    // six points is x = 10·V (hand: Sxy/Sxx = 40/4), so the curve lies on the line; a bow added to both sweeps at 1 V
    // of +3 nm moves the curve to 13 at 1 V. Line then: x̄ = 11, slope 10 (bow at the centre voltage leaves it),
    // intercept 11 − 10 = 1: deviations |0 − 1| = 1, |13 − 11| = 2, |20 − 21| = 1 → 2 nm over a 20 nm span.
    const bowed: CalibrationPoint[] = [
      { volts: 0, displacementNm: 0, sweep: 'up' },
      { volts: 1, displacementNm: 15, sweep: 'up' },
      { volts: 2, displacementNm: 20, sweep: 'up' },
      { volts: 2, displacementNm: 20, sweep: 'down' },
      { volts: 1, displacementNm: 11, sweep: 'down' },
      { volts: 0, displacementNm: 0, sweep: 'down' },
    ];
    const fit = fitCalibration(bowed, 'intercept');
    expect(fit.gainNmPerV).toBeCloseTo(10, 12);
    expect(fit.interceptNm).toBeCloseTo(1, 12);
    expect(fit.nonlinearityPctFs).toBeCloseTo((2 / 20) * 100, 10);
    expect(fit.hysteresisPctFs).toBeCloseTo((4 / 20) * 100, 10);
  });

  it('when no voltage is in both sweeps, then hysteresis is null', () => {
    const fit = fitCalibration([
      { volts: 0, displacementNm: 0, sweep: 'up' },
      { volts: 1, displacementNm: 10, sweep: 'up' },
      { volts: 2, displacementNm: 19, sweep: 'down' },
      { volts: 3, displacementNm: 31, sweep: 'down' },
    ]);
    expect(fit.hysteresisPctFs).toBeNull();
  });

  it('when −0 V and 0 V appear in the two sweeps, then they count as the same voltage', () => {
    const fit = fitCalibration([
      { volts: -0, displacementNm: 1, sweep: 'up' },
      { volts: 1, displacementNm: 10, sweep: 'up' },
      { volts: 0, displacementNm: 3, sweep: 'down' },
    ]);
    expect(fit.hysteresisPctFs).toBeCloseTo((2 / fit.spanNm) * 100, 12);
  });

  it('when all displacements are equal, then gain is 0 and R² and the %FS figures are null', () => {
    const fit = fitCalibration([
      { volts: 0, displacementNm: 5 },
      { volts: 1, displacementNm: 5 },
      { volts: 2, displacementNm: 5 },
    ]);
    expect(fit.gainNmPerV).toBe(0);
    expect(fit.r2).toBeNull();
    expect(fit.nonlinearityPctFs).toBeNull();
  });
});

describe('fitCalibrationInUnits and columns', () => {
  it('when points are in mV and µm, then the fit equals the fit of the converted points [S: NBS 1959 via units.ts]', () => {
    const recorded = [
      { volts: 0, displacement: 0.01, sweep: 'up' as const },
      { volts: 500, displacement: 0.06, sweep: 'up' as const },
      { volts: 1000, displacement: 0.105, sweep: 'up' as const },
      { volts: 500, displacement: 0.065, sweep: 'down' as const },
    ];
    const inUnits = fitCalibrationInUnits({ points: recorded, voltageUnit: 'mV', displacementUnit: 'um', model: 'intercept' });
    const direct = fitCalibration(recorded.map((p) => ({ volts: p.volts / 1000, displacementNm: p.displacement * 1000, sweep: p.sweep })));
    expect(inUnits).toEqual(direct);
    expect(inUnits.gainNmPerV).toBeCloseTo(95, 10);
  });

  it('when mil and the origin model are given, then gain is in nm/V', () => {
    const fit = fitCalibrationInUnits({
      points: [
        { volts: 10, displacement: 1 },
        { volts: 20, displacement: 2 },
        { volts: 30, displacement: 3 },
      ],
      displacementUnit: 'mil',
      model: 'origin',
    });
    expect(fit.gainNmPerV).toBeCloseTo(2540, 9); // 1 mil = 25 400 nm per 10 V
  });

  it('when typed columns are given, then the result equals the object path', () => {
    const points: CalibrationPoint[] = [0, 1, 2, 3, 2, 1, 0].map((v, i) => ({
      volts: v,
      displacementNm: 100 * v + (i < 4 ? -3 : 3) * Math.sin(v),
      sweep: i < 4 ? 'up' : 'down',
    }));
    const columns = {
      voltsV: Float64Array.from(points, (p) => p.volts),
      displacementNm: Float64Array.from(points, (p) => p.displacementNm),
      sweep: Uint8Array.from(points, (p) => (p.sweep === 'up' ? 1 : 2)),
    };
    expect(fitCalibrationColumns(columns, 'intercept')).toEqual(fitCalibration(points, 'intercept'));
  });

  it('when mapped to the DTO, then only the API fields remain', () => {
    const dto = toFitResultDto(fitCalibration([0, 1, 2].map((v) => ({ volts: v, displacementNm: 2 * v + (v === 1 ? 0.1 : 0) }))));
    expect(Object.keys(dto).sort()).toEqual(
      [
        'gainCi95NmPerV',
        'gainNmPerV',
        'gainStdErrNmPerV',
        'hysteresisPctFs',
        'interceptNm',
        'n',
        'nonlinearityPctFs',
        'r2',
        'residualStdNm',
        'spanNm',
      ].sort(),
    );
  });
});

describe('FitInputError', () => {
  const caught = (run: () => unknown): FitInputError | undefined => {
    try {
      run();
    } catch (error) {
      if (error instanceof FitInputError) return error;
      throw error;
    }
    return undefined;
  };
  const codeOf = (run: () => unknown): string | undefined => caught(run)?.code;
  const p = (volts: number, displacementNm: number): CalibrationPoint => ({ volts, displacementNm });

  it('when fewer than 3 points, then too_few_points', () => {
    expect(codeOf(() => fitCalibration([p(0, 0), p(1, 1)]))).toBe('too_few_points');
  });

  it('when a value is NaN or infinite, then non_finite_value with its index and field', () => {
    expect(codeOf(() => fitCalibration([p(0, 0), p(NaN, 1), p(2, 2)]))).toBe('non_finite_value');
    expect(codeOf(() => fitCalibration([p(0, 0), p(1, Infinity), p(2, 2)]))).toBe('non_finite_value');
    const error = caught(() =>
      fitCalibrationInUnits({
        points: [
          { volts: 0, displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: -Infinity },
        ],
        displacementUnit: 'nm',
      }),
    );
    expect(error?.code).toBe('non_finite_value');
    expect(error?.details).toEqual({ index: 2, field: 'displacement' });
  });

  it('when all voltages are equal, then voltages_all_equal (both models)', () => {
    expect(codeOf(() => fitCalibration([p(5, 0), p(5, 1), p(5, 2)], 'intercept'))).toBe('voltages_all_equal');
    expect(codeOf(() => fitCalibration([p(0, 0), p(-0, 1), p(0, 2)], 'origin'))).toBe('voltages_all_equal');
  });

  it('when more than 100 000 points, then too_many_points unless the caller raises the limit', () => {
    const many = Array.from({ length: MAX_FIT_POINTS + 1 }, (_, i) => p(i % 100, i % 100));
    expect(codeOf(() => fitCalibration(many))).toBe('too_many_points');
    expect(codeOf(() => fitCalibration(many, 'intercept', { maxPoints: Infinity }))).toBeUndefined();
  });

  it('when a converted value overflows, then numeric_overflow', () => {
    expect(
      codeOf(() =>
        fitCalibrationInUnits({
          points: [
            { volts: 0, displacement: 0 },
            { volts: 1, displacement: 1e305 },
            { volts: 2, displacement: 0 },
          ],
          displacementUnit: 'mil',
        }),
      ),
    ).toBe('numeric_overflow');
    expect(codeOf(() => fitCalibration([p(0, 1e200), p(1, -1e200), p(2, 1e200)]))).toBe('numeric_overflow');
  });
});
