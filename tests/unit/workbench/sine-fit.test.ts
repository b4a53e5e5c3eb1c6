import { Matrix, inverse, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { SineFitInput } from '@shared/schemas/sine-fit.ts';
import { sineFitCalculator } from '@shared/workbench/calculators/sine-fit-calculator.ts';
import { SineFitError, type SineFitErrorCode } from '@shared/workbench/sine-fit-error.ts';
import { fitSineRecord, fourParameterSineFit, sineLoopEllipse, wrapDegrees } from '@shared/workbench/sine-fit.ts';
import { gaussian, sineRecord, type SineRecordSpec } from '../../support/sine-record.ts';

const DEG = 180 / Math.PI;
const input = (samples: SineFitInput['samples'], extra: Partial<SineFitInput> = {}): SineFitInput => ({
  samples,
  voltageUnit: 'V',
  displacementUnit: 'nm',
  ...extra,
});

/** 18.25 periods of 7.3 Hz at 2 kHz: a record that does not hold whole periods. */
const base: SineRecordSpec = {
  n: 5000,
  sampleRateHz: 2000,
  frequencyHz: 7.3,
  startS: 0.5,
  voltsAmplitude: 12,
  voltsOffset: 1.5,
  phaseRad: 0.7,
  displacementAmplitude: 800,
  displacementOffset: -40,
  lagDeg: 25,
  voltsNoiseSd: 0.2,
  displacementNoiseSd: 15,
  seed: 7,
};

/**
 * The three-parameter fit computed another way: ml-matrix's QR least squares on the raw (uncentred)
 * design matrix [cos ωt, sin ωt, 1], the covariance σ²·(XᵀX)⁻¹ by its general inverse.
 */
function referenceFit(times: number[], y: number[], frequencyHz: number) {
  const w = 2 * Math.PI * frequencyHz;
  const X = new Matrix(times.map((t) => [Math.cos(w * t), Math.sin(w * t), 1]));
  const beta = solve(X, Matrix.columnVector(y)).to1DArray();
  const [a, b, c] = beta;
  const residuals = times.map((t, i) => y[i] - a * Math.cos(w * t) - b * Math.sin(w * t) - c);
  const sigma2 = residuals.reduce((s, r) => s + r * r, 0) / (times.length - 3);
  const cov = inverse(X.transpose().mmul(X)).mul(sigma2);
  const r = Math.hypot(a, b);
  const uR = Math.sqrt(a * a * cov.get(0, 0) + b * b * cov.get(1, 1) + 2 * a * b * cov.get(0, 1)) / r;
  return { amplitude: r, phase: Math.atan2(a, b), offset: c, residualSd: Math.sqrt(sigma2), uAmplitude: uR };
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function refusal(run: () => unknown): SineFitError {
  try {
    run();
  } catch (err) {
    if (err instanceof SineFitError) return err;
    throw err;
  }
  throw new Error('expected a SineFitError');
}

const expectRefused = (run: () => unknown, code: SineFitErrorCode) => {
  const err = refusal(run);
  expect(err.code, err.message).toBe(code);
  expect(err.message).toMatch(/\S/);
  return err;
};

describe('three-parameter fit at a known frequency [S: IEEE Std 1057-2017 three-parameter sine fit]', () => {
  const samples = sineRecord(base);
  const fit = fitSineRecord(input(samples, { frequencyHz: base.frequencyHz }));
  const times = samples.map((s) => s.timeS);
  const drive = referenceFit(
    times,
    samples.map((s) => s.volts),
    base.frequencyHz,
  );
  const disp = referenceFit(
    times,
    samples.map((s) => s.displacement),
    base.frequencyHz,
  );

  it('when compared with an independent QR least squares (ml-matrix), then amplitudes, offsets and residual SDs agree to 1e-9 [calc]', () => {
    expect(fit.frequencyKnown).toBe(true);
    expect(fit.iterations).toBe(0);
    expect(fit.frequencyHz).toBe(base.frequencyHz);
    expect(rel(fit.voltsAmplitudeV, drive.amplitude)).toBeLessThan(1e-9);
    expect(rel(fit.voltsOffsetV, drive.offset)).toBeLessThan(1e-9);
    expect(rel(fit.voltsResidualStdV, drive.residualSd)).toBeLessThan(1e-9);
    expect(rel(fit.displacementAmplitudeNm, disp.amplitude)).toBeLessThan(1e-9);
    expect(rel(fit.displacementOffsetNm, disp.offset)).toBeLessThan(1e-9);
    expect(rel(fit.residualStdNm, disp.residualSd)).toBeLessThan(1e-9);
  });

  it('when compared with the reference, then gain = R_x/R_V and lag = φ_V − φ_x agree (the lag does not depend on the time origin) [calc]', () => {
    expect(rel(fit.gainNmPerV, disp.amplitude / drive.amplitude)).toBeLessThan(1e-9);
    expect(Math.abs(fit.phaseLagDeg - wrapDegrees((drive.phase - disp.phase) * DEG))).toBeLessThan(1e-7);
  });

  it('when the amplitude uncertainties come from the covariance σ²(XᵀX)⁻¹, then they match the reference covariance [calc]', () => {
    expect(rel(fit.voltsAmplitudeStdUncV, drive.uAmplitude)).toBeLessThan(1e-6);
    expect(rel(fit.displacementAmplitudeStdUncNm, disp.uAmplitude)).toBeLessThan(1e-6);
    const relGain = Math.hypot(disp.uAmplitude / disp.amplitude, drive.uAmplitude / drive.amplitude);
    expect(rel(fit.gainStdUncNmPerV, fit.gainNmPerV * relGain)).toBeLessThan(1e-6);
  });

  it('when the generating values are known, then the fit finds them within four standard uncertainties [calc]', () => {
    expect(Math.abs(fit.voltsAmplitudeV - 12)).toBeLessThan(4 * fit.voltsAmplitudeStdUncV);
    expect(Math.abs(fit.displacementAmplitudeNm - 800)).toBeLessThan(4 * fit.displacementAmplitudeStdUncNm);
    expect(Math.abs(fit.gainNmPerV - 800 / 12)).toBeLessThan(4 * fit.gainStdUncNmPerV);
    expect(Math.abs(fit.phaseLagDeg - 25)).toBeLessThan(4 * fit.phaseLagStdUncDeg);
    expect(rel(fit.periods, 18.2463)).toBeLessThan(1e-4); // 7.3 Hz × 4999/2000 s [calc]
  });

  it('when samples are evenly spaced over whole periods, then u(R) = σ·√(2/N) exactly [calc: discrete orthogonality of cos and sin]', () => {
    const whole = fitSineRecord(input(sineRecord({ ...base, n: 4000, sampleRateHz: 1000, frequencyHz: 5 }), { frequencyHz: 5 }));
    expect(rel(whole.voltsAmplitudeStdUncV, whole.voltsResidualStdV * Math.sqrt(2 / 4000))).toBeLessThan(1e-9);
    expect(rel(whole.displacementAmplitudeStdUncNm, whole.residualStdNm * Math.sqrt(2 / 4000))).toBeLessThan(1e-9);
  });

  it('when the same record is given in mV and µm, then the gain and lag are unchanged [calc]', () => {
    const scaled = samples.map((s) => ({ timeS: s.timeS, volts: s.volts * 1000, displacement: s.displacement / 1000 }));
    const again = fitSineRecord({ samples: scaled, voltageUnit: 'mV', displacementUnit: 'um', frequencyHz: base.frequencyHz });
    expect(rel(again.gainNmPerV, fit.gainNmPerV)).toBeLessThan(1e-12);
    expect(Math.abs(again.phaseLagDeg - fit.phaseLagDeg)).toBeLessThan(1e-9);
  });

  it('when fitted many times over fresh noise, then the spread of the gain matches its stated uncertainty within 20 % [calc: Monte Carlo, 300 records]', () => {
    const gains: number[] = [];
    let reported = 0;
    for (let seed = 1; seed <= 300; seed++) {
      const f = fitSineRecord(input(sineRecord({ ...base, n: 400, sampleRateHz: 100, frequencyHz: 2.3, seed }), { frequencyHz: 2.3 }));
      gains.push(f.gainNmPerV);
      reported += f.gainStdUncNmPerV / 300;
    }
    const mean = gains.reduce((s, g) => s + g, 0) / gains.length;
    const sd = Math.sqrt(gains.reduce((s, g) => s + (g - mean) ** 2, 0) / (gains.length - 1));
    expect(rel(sd, reported)).toBeLessThan(0.2);
  });
});

describe('four-parameter fit, frequency refined [S: IEEE Std 1057-2017 four-parameter sine fit; Händel, IEEE TIM 49 (2000) 1189]', () => {
  const samples = sineRecord(base);
  const times = samples.map((s) => s.timeS);
  const volts = samples.map((s) => s.volts);

  it('when a noiseless record starts 1 % off in frequency, then frequency, amplitude, offset and phase come back to 1e-9 [calc]', () => {
    const clean = sineRecord({ ...base, voltsNoiseSd: 0, displacementNoiseSd: 0 });
    const f = fourParameterSineFit(
      times,
      clean.map((s) => s.volts),
      base.frequencyHz * 1.01,
    );
    expect(rel(f.frequencyHz, 7.3)).toBeLessThan(1e-9);
    expect(rel(f.amplitude, 12)).toBeLessThan(1e-9);
    expect(rel(f.offset, 1.5)).toBeLessThan(1e-9);
    expect(Math.abs(f.phaseRad - 0.7)).toBeLessThan(1e-8);
    expect(f.iterations).toBeGreaterThan(1);
  });

  it.each([0.99, 1.01, 0.995])(
    'when a noisy record starts at %s × the frequency, then f within 1e-4, R within 0.02 V, φ within 0.01 rad [calc: σ√(2/N) ≈ 0.004 V]',
    (factor) => {
      const f = fourParameterSineFit(times, volts, base.frequencyHz * factor);
      expect(rel(f.frequencyHz, 7.3)).toBeLessThan(1e-4);
      expect(Math.abs(f.amplitude - 12)).toBeLessThan(0.02);
      expect(Math.abs(f.phaseRad - 0.7)).toBeLessThan(0.01);
      expect(Math.abs(f.offset - 1.5)).toBeLessThan(0.02);
    },
  );

  it('when the frequency is not given, then the record fit starts from zero crossings and finds f, gain and lag within four standard uncertainties [calc]', () => {
    const fit = fitSineRecord(input(samples));
    expect(fit.frequencyKnown).toBe(false);
    expect(fit.iterations).toBeGreaterThan(0);
    expect(fit.frequencyStdUncHz).not.toBeNull();
    expect(Math.abs(fit.frequencyHz - 7.3)).toBeLessThan(4 * (fit.frequencyStdUncHz as number));
    expect(Math.abs(fit.gainNmPerV - 800 / 12)).toBeLessThan(4 * fit.gainStdUncNmPerV);
    expect(Math.abs(fit.phaseLagDeg - 25)).toBeLessThan(4 * fit.phaseLagStdUncDeg);
    expect(fit.voltsExplainedFraction).toBeGreaterThan(0.99);
  });

  it('when the record starts mid-cycle at an odd time and carries a large offset, then the fit still converges [calc]', () => {
    const odd = sineRecord({ ...base, startS: 123.456, voltsOffset: 40, phaseRad: -2.9, seed: 11 });
    const fit = fitSineRecord(input(odd));
    expect(rel(fit.frequencyHz, 7.3)).toBeLessThan(1e-4);
    expect(Math.abs(fit.voltsOffsetV - 40)).toBeLessThan(0.02);
  });
});

describe('gain and phase lag', () => {
  it.each([
    [-30, -30],
    [170, 170],
    [180, 180],
    [-179, -179],
  ])('when the displacement lags by %s°, then phaseLagDeg is %s (wrapped to (−180, 180]) [calc]', (lagDeg, expected) => {
    const fit = fitSineRecord(input(sineRecord({ ...base, lagDeg, voltsNoiseSd: 0, displacementNoiseSd: 0 }), { frequencyHz: 7.3 }));
    expect(Math.abs(wrapDegrees(fit.phaseLagDeg - expected))).toBeLessThan(1e-8);
  });

  it.each([
    [180, 180],
    [-180, 180],
    [190, -170],
    [-190, 170],
    [540, 180],
    [0, 0],
  ])('when %s° is wrapped, then %s° [calc]', (deg, expected) => {
    expect(wrapDegrees(deg)).toBeCloseTo(expected, 12);
  });

  it('when the displacement moves against the drive, then the calculator warns displacement_inverted [practice]', () => {
    const r = sineFitCalculator.compute(input(sineRecord({ ...base, lagDeg: 180 })));
    expect(r.warnings.map((w) => w.code)).toContain('displacement_inverted');
  });
});

describe('loop ellipse', () => {
  const fit = { voltsAmplitudeV: 10, voltsOffsetV: 2, displacementAmplitudeNm: 500, displacementOffsetNm: -5, phaseLagDeg: 30 };

  it('when drawn with 200 points, then it is closed and passes the drive peak at x₀ + R_x·sin(90° − lag) [calc]', () => {
    const e = sineLoopEllipse(fit);
    expect(e).toHaveLength(201);
    expect(e[200]).toEqual(e[0]);
    expect(e[50].volts).toBeCloseTo(12, 12);
    expect(e[50].displacementNm).toBeCloseTo(-5 + 500 * Math.cos(Math.PI / 6), 9);
  });

  it('when there is no lag, then the loop closes to a line of slope R_x/R_V [calc]', () => {
    for (const p of sineLoopEllipse({ ...fit, phaseLagDeg: 0 }, 40)) expect(p.displacementNm + 5).toBeCloseTo(50 * (p.volts - 2), 9);
  });
});

describe('refusals', () => {
  it.each([
    ['a known frequency', { frequencyHz: 7.3 }],
    ['no frequency', {}],
  ])('when 1.5 periods are recorded with %s, then record_too_short [practice: about two periods]', (_name, extra) => {
    const short = sineRecord({ ...base, n: 411, sampleRateHz: 2000 });
    const err = expectRefused(() => fitSineRecord(input(short, extra)), 'record_too_short');
    expect(err.details?.periods).toBeLessThan(1.9);
  });

  it('when the drive is a square wave (81 % of its power in the fundamental), then no_clear_sine [calc: 8/π²]', () => {
    const square = sineRecord(base).map((s) => ({ ...s, volts: Math.sign(Math.sin(2 * Math.PI * 7.3 * s.timeS)) * 10 }));
    const err = expectRefused(() => fitSineRecord(input(square, { frequencyHz: 7.3 })), 'no_clear_sine');
    expect(err.details?.explainedFraction).toBeCloseTo(8 / Math.PI ** 2, 1);
  });

  it('when the drive is a triangle (98.6 % in the fundamental), then it is fitted with a drive_not_clean warning [calc: 96/π⁴]', () => {
    const tri = sineRecord(base).map((s) => ({ ...s, volts: (2 / Math.PI) * Math.asin(Math.sin(2 * Math.PI * 7.3 * s.timeS)) * 10 }));
    const r = sineFitCalculator.compute(input(tri));
    expect(r.voltsExplainedFraction).toBeCloseTo(96 / Math.PI ** 4, 3);
    expect(r.warnings.map((w) => w.code)).toContain('drive_not_clean');
  });

  it.each([
    ['a known frequency', { frequencyHz: 7.3 }],
    ['no frequency', {}],
  ])('when the drive is noise only, with %s, then no_clear_sine [practice]', (_name, extra) => {
    const g = gaussian(99);
    const noise = sineRecord(base).map((s) => ({ ...s, volts: g() }));
    expectRefused(() => fitSineRecord(input(noise, extra)), 'no_clear_sine');
  });

  it('when the drive is constant, then no_clear_sine', () => {
    expectRefused(() => fitSineRecord(input(sineRecord({ ...base, voltsAmplitude: 0, voltsNoiseSd: 0 }))), 'no_clear_sine');
  });

  it('when a time repeats, then times_not_increasing at that sample', () => {
    const s = sineRecord(base);
    s[100] = { ...s[100], timeS: s[99].timeS };
    const err = expectRefused(() => fitSineRecord(input(s)), 'times_not_increasing');
    expect(err.details).toEqual({ index: 100, field: 'timeS' });
  });

  it('when a value is not finite, then non_finite_value at that sample and field', () => {
    const s = sineRecord(base);
    s[7] = { ...s[7], displacement: Number.NaN };
    const err = expectRefused(() => fitSineRecord(input(s)), 'non_finite_value');
    expect(err.details).toEqual({ index: 7, field: 'displacement' });
  });

  it('when there are fewer than 8 samples, then too_few_samples; above maxSamples, too_many_samples', () => {
    expectRefused(() => fitSineRecord(input(sineRecord({ ...base, n: 7, sampleRateHz: 2 }), { frequencyHz: 1 })), 'too_few_samples');
    expectRefused(() => fitSineRecord(input(sineRecord(base)), { maxSamples: 4999 }), 'too_many_samples');
  });

  it('when the frequency makes every sample fall at the same phase, then no_clear_sine rather than a wrong fit', () => {
    // 2000 Hz sampled at 2000 Hz: cos and sin are constant, so they cannot be told from the offset [calc].
    expectRefused(() => fitSineRecord(input(sineRecord(base), { frequencyHz: 2000 })), 'no_clear_sine');
  });
});

describe('sine-fit calculator cautions [S: IEC 61010-1 2nd ed. clause 6.3.1 — memory]', () => {
  it('when the drive peaks at |offset| + amplitude = 50 V, then the IEC 61010-1 cautions are shown', () => {
    const r = sineFitCalculator.compute(input(sineRecord({ ...base, voltsAmplitude: 40, voltsOffset: 10 })));
    expect(r.cautions.map((c) => c.id)).toContain('levels');
    expect(r.levelsCrossed.join(' ')).toMatch(/peak/);
  });

  it('when the drive peaks at 40 V (no offset, small noise), then no cautions', () => {
    const r = sineFitCalculator.compute(input(sineRecord({ ...base, voltsAmplitude: 40, voltsOffset: 0, voltsNoiseSd: 0.01 })));
    expect(r.cautions).toEqual([]);
  });
});
