import { describe, expect, test } from 'vitest';
import { workbenchClient } from '../support/workbench-client.ts';

const client = workbenchClient();

const { post } = client;
const errorShape = (code: string) => ({ error: { code, message: expect.any(String) } });

describe('POST /api/workbench/loaded-gain', () => {
  test('when 100 nm/V works against a spring a quarter as stiff, then 200 with 80 nm/V and 20 % lost [calc]', async () => {
    const res = await post('loaded-gain', { freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, springRateNPerM: 250, preloadForceN: 1 });
    expect(res.status).toBe(200);
    expect(res.body.loadedGainNmPerV).toBeCloseTo((100 * 1000) / 1250, 12);
    expect(res.body.gainLossPct).toBeCloseTo(20, 12);
    expect(res.body.preloadDeflectionNm).toBeCloseTo(1e6, 6); // 1 N / 1000 N/m = 1 mm [calc]
    expect(res.body).toMatchObject({ warnings: [], cautions: [] });
  });

  test('when the spring rate is negative, then 400 validation_failed', async () => {
    const res = await post('loaded-gain', { freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, springRateNPerM: -1 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('validation_failed'));
  });

  test('when both a stiffness and a bender geometry are sent, then 400 invalid_input', async () => {
    const bender = { lengthM: 12e-3, widthM: 2e-3, thicknessM: 0.6e-3, youngsModulusPa: 61e9 };
    const res = await post('loaded-gain', { freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, bender, springRateNPerM: 10 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('invalid_input'));
  });
});

describe('POST /api/workbench/tube', () => {
  const tube = {
    lengthMm: 12.7,
    outerDiameterMm: 6.35,
    wallMm: 0.508,
    relPermittivity: 3400,
    youngsModulusPa: 60.6e9,
    densityKgPerM3: 7500,
  };

  test("when FIELD.md's PZT-5H tube is posted, then 200 with a quadrant of C = 2π·ε0·εr·L/ln(OD/ID)/4 ≈ 3.4 nF [memory; calc]", async () => {
    const res = await post('tube', tube);
    expect(res.status).toBe(200);
    const whole = (2 * Math.PI * 8.8541878128e-12 * 3400 * 12.7e-3) / Math.log(6.35 / 5.334);
    expect(res.body.quadrantCapacitanceF / (whole / 4)).toBeCloseTo(1, 12);
    expect(res.body.quadrantCapacitanceF * 1e9).toBeCloseTo(3.4, 1);
    expect(res.body.axialModeHz).toBeCloseTo(Math.sqrt(60.6e9 / 7500) / (4 * 12.7e-3), 6);
  });

  test('when the density is a string, then 400 validation_failed', async () => {
    const res = await post('tube', { ...tube, densityKgPerM3: '7500' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('validation_failed'));
  });

  test('when the wall is half the outer diameter, then 400 invalid_input', async () => {
    const res = await post('tube', { ...tube, wallMm: 3.175 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('invalid_input'));
  });
});

describe('POST /api/workbench/drive-limits', () => {
  const drive = { capacitanceF: 3.4e-9, amplitudeV: 100, frequencyHz: 1000 };

  test('when 3.4 nF is driven at 100 V, 1 kHz, then 200 with 2.1 mA peak and the high-voltage cautions [calc; S: IEC 61010-1]', async () => {
    const res = await post('drive-limits', { ...drive, currentLimitA: 1e-3 });
    expect(res.status).toBe(200);
    expect(res.body.sinePeakCurrentA * 1e3).toBeCloseTo(2.1, 1);
    expect(res.body.currentLimitedMaxHz).toBeCloseTo(1e-3 / (2 * Math.PI * 3.4e-9 * 100), 9);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(['sine_over_current_limit']);
    expect(res.body.cautions.map((c: { id: string }) => c.id)).toContain('levels');
  });

  test('when the capacitance is zero, then 400 validation_failed', async () => {
    const res = await post('drive-limits', { ...drive, capacitanceF: 0 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('validation_failed'));
  });

  test('when a raster swing comes without its line rate, then 400 invalid_input', async () => {
    const res = await post('drive-limits', { ...drive, rasterSwingPpV: 200 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('invalid_input'));
  });
});

describe('POST /api/workbench/noise-floor', () => {
  test('when a 0.1 N/m lever at 295 K is the only source, then 200 with 0.20 nm and thermal dominant [calc, FIELD.md check]', async () => {
    const res = await post('noise-floor', { actuatorGainNmPerV: 102.6, cantileverStiffnessNPerM: 0.1, temperatureK: 295 });
    expect(res.status).toBe(200);
    expect(res.body.totalNoiseNm).toBeCloseTo(0.2, 2);
    expect(res.body.thermalNoiseNm).toBeCloseTo(Math.sqrt((1.380649e-23 * 295) / 0.1) * 1e9, 12);
    expect(res.body).toMatchObject({ dominant: 'thermal', cautions: [] });
  });

  test('when the DAC bits are fractional, then 400 validation_failed', async () => {
    const res = await post('noise-floor', { actuatorGainNmPerV: 102.6, ampGainVPerV: 30, dacBits: 15.5, dacSpanV: 10 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('validation_failed'));
  });

  test('when the DAC comes without the amplifier gain, then 400 invalid_input', async () => {
    const res = await post('noise-floor', { actuatorGainNmPerV: 102.6, dacBits: 16, dacSpanV: 10 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape('invalid_input'));
  });
});
