import { describe, expect, it } from 'vitest';
import {
  creepInput,
  driveCurrentInput,
  expectedGainInput,
  fitInput,
  mixingInput,
  scanPlanInput,
  tunnellingInput,
  unitConversionInput,
  type ExpectedGainInput,
} from '@shared/schemas/workbench.ts';
import { expectedGain, type ExpectedGainSpec } from '@shared/workbench/expected-gain.ts';
import { fitCalibrationInUnits } from '@shared/workbench/calibration-fit.ts';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';

const points = [
  { volts: 0, displacement: 0, sweep: 'up' },
  { volts: 1, displacement: 0.1, sweep: 'up' },
  { volts: 2, displacement: 0.21 },
];

describe('fitInput', () => {
  it('when a minimal body is sent, then defaults fill voltageUnit V and model intercept', () => {
    const parsed = fitInput.parse({ points, displacementUnit: 'um' });
    expect(parsed.voltageUnit).toBe('V');
    expect(parsed.model).toBe('intercept');
    expect(fitCalibrationInUnits(parsed).gainNmPerV).toBeCloseTo(105, 9);
  });

  it.each([
    ['fewer than 3 points', { points: points.slice(0, 2), displacementUnit: 'nm' }],
    ['a string value', { points: [...points.slice(0, 2), { volts: '2', displacement: 1 }], displacementUnit: 'nm' }],
    ['a null value', { points: [...points.slice(0, 2), { volts: 2, displacement: null }], displacementUnit: 'nm' }],
    ['NaN', { points: [...points.slice(0, 2), { volts: NaN, displacement: 1 }], displacementUnit: 'nm' }],
    ['Infinity', { points: [...points.slice(0, 2), { volts: 2, displacement: Infinity }], displacementUnit: 'nm' }],
    ['an unknown unit', { points, displacementUnit: 'inch' }],
    ['an unknown voltage unit', { points, displacementUnit: 'nm', voltageUnit: 'kV' }],
    ['a missing displacement unit', { points }],
    ['an unknown model', { points, displacementUnit: 'nm', model: 'quadratic' }],
    ['an unknown sweep', { points: [...points.slice(0, 2), { volts: 2, displacement: 1, sweep: 'sideways' }], displacementUnit: 'nm' }],
    ['an extra field', { points, displacementUnit: 'nm', extra: 1 }],
    ['an extra point field', { points: [...points.slice(0, 2), { volts: 2, displacement: 1, note: 'x' }], displacementUnit: 'nm' }],
  ])('when the body has %s, then it is rejected', (_label, body) => {
    expect(fitInput.safeParse(body).success).toBe(false);
  });

  it('when more than 100 000 points are sent, then it is rejected; exactly 100 000 pass', () => {
    const make = (n: number) => Array.from({ length: n }, (_, i) => ({ volts: i % 7, displacement: i % 7 }));
    expect(fitInput.safeParse({ points: make(100_001), displacementUnit: 'nm' }).success).toBe(false);
    expect(fitInput.safeParse({ points: make(100_000), displacementUnit: 'nm' }).success).toBe(true);
  });

  it('when all voltages are equal, then the schema passes it and the fit throws voltages_all_equal', () => {
    const parsed = fitInput.parse({ points: points.map((p) => ({ ...p, volts: 3 })), displacementUnit: 'nm' });
    expect(() => fitCalibrationInUnits(parsed)).toThrow(FitInputError);
  });
});

describe('other calculator inputs', () => {
  it('when an expected-gain body is parsed, then it is a valid ExpectedGainSpec for the dispatcher', () => {
    const parsed: ExpectedGainInput = expectedGainInput.parse({
      actuator: 'tube-quadrant',
      material: 'PZT-5H',
      lengthMm: 12.7,
      outerDiameterMm: 6.35,
      wallMm: 0.508,
    });
    const spec: ExpectedGainSpec = parsed;
    expect(expectedGain(spec).gainNmPerV).toBeCloseTo(6.7, 2); // one quadrant [S: C. J. Chen, APL 60, 132 (1992); FIELD check value]
    expect(
      expectedGainInput.safeParse({ actuator: 'bimorph-series', material: { d31PmPerV: -190 }, lengthMm: 10, thicknessMm: 0.5 }).success,
    ).toBe(true);
    expect(expectedGainInput.safeParse({ actuator: 'bimorph-series', material: 'PZT-9', lengthMm: 10, thicknessMm: 0.5 }).success).toBe(
      false,
    );
    expect(expectedGainInput.safeParse({ actuator: 'stack', material: 'PZT-5A', layers: 2.5 }).success).toBe(false);
    expect(expectedGainInput.safeParse({ actuator: 'tube-axial', material: 'PZT-5A', lengthMm: 10 }).success).toBe(false);
  });

  it('when mixing limits are inverted, then they are rejected', () => {
    const gain = [
      [70, -70],
      [70, 70],
    ];
    expect(mixingInput.safeParse({ gain, limits: { vaMinV: 0, vaMaxV: 150, vbMinV: 0, vbMaxV: 150 } }).success).toBe(true);
    expect(mixingInput.safeParse({ gain, limits: { vaMinV: 150, vaMaxV: 0, vbMinV: 0, vbMaxV: 150 } }).success).toBe(false);
    expect(mixingInput.safeParse({ gain: [[1, 2]], limits: { vaMinV: 0, vaMaxV: 1, vbMinV: 0, vbMaxV: 1 } }).success).toBe(false);
  });

  it('when numbers are out of range or of the wrong kind, then they are rejected', () => {
    const plan = { dacBits: 16, dacSpanV: 10, ampGainVPerV: 30, actuatorGainNmPerV: 102.6, pixelsPerLine: 256, lines: 256, lineRateHz: 1 };
    expect(scanPlanInput.safeParse(plan).success).toBe(true);
    expect(scanPlanInput.safeParse({ ...plan, dacBits: 16.5 }).success).toBe(false);
    expect(scanPlanInput.safeParse({ ...plan, lineRateHz: 0 }).success).toBe(false);
    expect(driveCurrentInput.safeParse({ capacitanceF: -1e-9, amplitudeV: 100, frequencyHz: 1000 }).success).toBe(false);
    expect(tunnellingInput.safeParse({ workFunctionEv: 4 }).success).toBe(true);
    expect(tunnellingInput.safeParse({ workFunctionEv: '4' }).success).toBe(false);
    expect(creepInput.safeParse({ samples: [{ timeS: 0, displacementNm: 1 }] }).success).toBe(false);
    expect(unitConversionInput.safeParse({ value: 1, from: 'mil', to: 'angstrom' }).success).toBe(true);
    expect(unitConversionInput.safeParse({ value: 1, from: 'mils', to: 'nm' }).success).toBe(false);
  });
});
