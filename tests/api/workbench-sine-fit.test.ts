import { describe, expect, test } from 'vitest';
import { MAX_SINE_SAMPLES } from '../../shared/schemas/sine-fit.ts';
import { expectError } from '../support/expect-error.ts';
import { sineRecord, type SineRecordSpec } from '../support/sine-record.ts';
import { workbenchClient } from '../support/workbench-client.ts';

const { post } = workbenchClient();

/** 20.5 periods of 4.1 Hz at 1 kHz: 12 V on a 2 V offset, 900 nm at a 35° lag, with noise. */
const spec: SineRecordSpec = {
  n: 5000,
  sampleRateHz: 1000,
  frequencyHz: 4.1,
  voltsAmplitude: 12,
  voltsOffset: 2,
  displacementAmplitude: 900,
  lagDeg: 35,
  voltsNoiseSd: 0.05,
  displacementNoiseSd: 5,
  seed: 3,
};
const samples = sineRecord(spec);

describe('POST /api/workbench/sine-fit', () => {
  test('when a record is posted without its frequency, then 200 with the fitted frequency, amplitudes, gain, lag and residual SD [calc; S: IEEE Std 1057-2017 four-parameter fit]', async () => {
    const res = await post('sine-fit', { samples, displacementUnit: 'nm' });
    expect(res.status, res.text.slice(0, 300)).toBe(200);
    expect(res.body).toMatchObject({
      n: 5000,
      frequencyKnown: false,
      frequencyHz: expect.closeTo(4.1, 3),
      voltsAmplitudeV: expect.closeTo(12, 2),
      voltsOffsetV: expect.closeTo(2, 2),
      displacementAmplitudeNm: expect.closeTo(900, 0),
      gainNmPerV: expect.closeTo(75, 0),
      phaseLagDeg: expect.closeTo(35, 0),
      residualStdNm: expect.closeTo(5, 0),
      voltsResidualStdV: expect.closeTo(0.05, 2),
      iterations: expect.any(Number),
      warnings: [],
      cautions: [],
    });
    expect(res.body.gainStdUncNmPerV).toBeGreaterThan(0);
    expect(res.body.periods).toBeCloseTo(4.1 * 4.999, 2);
  });

  test('when the frequency is given and units are mV and µm, then the three-parameter fit answers in V, nm and nm/V [calc]', async () => {
    const scaled = samples.map((s) => ({ timeS: s.timeS, volts: s.volts * 1000, displacement: s.displacement / 1000 }));
    const res = await post('sine-fit', { samples: scaled, voltageUnit: 'mV', displacementUnit: 'um', frequencyHz: 4.1 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ frequencyKnown: true, frequencyHz: 4.1, iterations: 0, frequencyStdUncHz: null });
    expect(res.body.gainNmPerV).toBeCloseTo(75, 0);
  });

  test('when the drive peaks above 42.4 V (|offset| + amplitude), then the IEC 61010-1 cautions come back [S: IEC 61010-1 — memory]', async () => {
    const res = await post('sine-fit', { samples: sineRecord({ ...spec, voltsAmplitude: 45, voltsOffset: 0 }), displacementUnit: 'nm' });
    expect(res.status).toBe(200);
    expect(res.body.cautions.map((c: { id: string }) => c.id)).toContain('levels');
  });

  test('when the record holds 1.5 periods, then 400 record_too_short', async () => {
    expectError(await post('sine-fit', { samples: samples.slice(0, 366), displacementUnit: 'nm' }), 400, 'record_too_short');
  });

  test('when the drive is noise, then 400 no_clear_sine', async () => {
    const noisy = sineRecord({ ...spec, voltsAmplitude: 0, voltsNoiseSd: 1 });
    expectError(await post('sine-fit', { samples: noisy, displacementUnit: 'nm', frequencyHz: 4.1 }), 400, 'no_clear_sine');
  });

  test('when a time goes backwards, then 400 times_not_increasing with the sample index', async () => {
    const bad = samples.map((s, i) => (i === 10 ? { ...s, timeS: 0 } : s));
    const res = expectError(await post('sine-fit', { samples: bad, displacementUnit: 'nm' }), 400, 'times_not_increasing');
    expect(res.body.error.details).toEqual({ index: 10, field: 'timeS' });
  });

  test.each([
    ['fewer than 8 samples', { samples: samples.slice(0, 7), displacementUnit: 'nm' }, 'samples'],
    [
      'a null volts (NaN in JSON)',
      { samples: [...samples.slice(0, 3), { timeS: 1, volts: null, displacement: 1 }], displacementUnit: 'nm' },
      'samples.3.volts',
    ],
    ['an unknown displacement unit', { samples, displacementUnit: 'furlong' }, 'displacementUnit'],
    ['a zero frequency', { samples, displacementUnit: 'nm', frequencyHz: 0 }, 'frequencyHz'],
    ['an extra field on a sample', { samples: [{ ...samples[0], sweep: 'up' }, ...samples.slice(1)], displacementUnit: 'nm' }, 'samples.0'],
  ])('when the body has %s, then 400 validation_failed on that field', async (_name, body, path) => {
    expectError(await post('sine-fit', body), 400, 'validation_failed', path);
  });
});

describe('POST /api/workbench/sine-fit at the sample limit', () => {
  test(`when ${MAX_SINE_SAMPLES} samples with full-precision numbers (more than 12 MB of JSON) are posted, then 200`, async () => {
    const big = sineRecord({ ...spec, n: MAX_SINE_SAMPLES, sampleRateHz: 20_000, frequencyHz: 11.7 });
    const res = await post('sine-fit', { samples: big, displacementUnit: 'nm' });
    expect(res.status, res.text.slice(0, 300)).toBe(200);
    expect(res.body.n).toBe(MAX_SINE_SAMPLES);
    expect(res.body.frequencyHz).toBeCloseTo(11.7, 4);
  }, 60_000);

  test(`when ${MAX_SINE_SAMPLES + 1} samples are posted, then 400 validation_failed on samples saying the limit`, async () => {
    const over = Array.from({ length: MAX_SINE_SAMPLES + 1 }, (_, i) => ({ timeS: i, volts: i % 7, displacement: i % 5 }));
    const res = expectError(await post('sine-fit', { samples: over, displacementUnit: 'nm' }), 400, 'validation_failed', 'samples');
    expect(res.body.error.message).toMatch(/200000|200 000|200,000/);
  }, 60_000);
});
