import { describe, expect, it } from 'vitest';
import { rootMeanSquare, standardDeviation } from 'simple-statistics';
import { noiseFloorInput } from '@shared/schemas/workbench-extras.ts';
import { noiseFloorCalculator } from '@shared/workbench/calculators/noise-floor-calculator.ts';
import { BOLTZMANN_J_PER_K, amplifierNoiseNm, dacQuantisationNm, rootSumSquare, thermalNoiseNm } from '@shared/workbench/noise-floor.ts';

const compute = (body: unknown) => noiseFloorCalculator.compute(noiseFloorInput.parse(body));
// FIELD.md's drive chain: 102.6 nm/V over 300 V (10 V DAC span × 30) at 16 bit.
const chain = { dacBits: 16, dacSpanV: 10, ampGainVPerV: 30, actuatorGainNmPerV: 102.6 };

describe('thermal noise √(k_B·T/k) [S: equipartition theorem]', () => {
  it('when k_B is used, then it is the exact 2019 SI value [S: BIPM SI Brochure, 9th ed. (2019)]', () => {
    expect(BOLTZMANN_J_PER_K).toBe(1.380649e-23);
  });

  it('when a 0.1 N/m lever sits at 295 K, then 0.20 nm rms [calc, FIELD.md check]', () => {
    expect(thermalNoiseNm(0.1, 295)).toBeCloseTo(0.2, 2);
    expect(thermalNoiseNm(0.1, 295)).toBeCloseTo(Math.sqrt((1.380649e-23 * 295) / 0.1) * 1e9, 12);
  });

  it('when the spring is 100× stiffer, then the motion is 10× smaller [calc]', () => {
    expect(thermalNoiseNm(0.1, 295) / thermalNoiseNm(10, 295)).toBeCloseTo(10, 12);
  });
});

describe('amplifier noise e_n·√B·G·g [calc; white noise]', () => {
  it('when 1 µV/√Hz over 10 kHz goes through ×30 and 100 nm/V, then 100 µV → 3 mV → 0.3 nm [calc]', () => {
    expect(amplifierNoiseNm({ noiseDensityVPerRtHz: 1e-6, bandwidthHz: 1e4, ampGainVPerV: 30, actuatorGainNmPerV: 100 })).toBeCloseTo(
      0.3,
      12,
    );
  });
});

describe('DAC quantisation LSB/√12 [S: W. R. Bennett, Bell Syst. Tech. J. 27, 446 (1948)]', () => {
  it('when 102.6 nm/V spans 300 V at 16 bit, then the LSB is 0.47 nm [calc, FIELD.md check] and the noise LSB/√12', () => {
    const q = dacQuantisationNm(chain);
    expect(q.lsbNm).toBeCloseTo(0.47, 2);
    expect(q.lsbNm).toBeCloseTo((102.6 * 300) / 2 ** 16, 12);
    expect(q.noiseNm).toBeCloseTo(q.lsbNm / Math.sqrt(12), 14);
    expect(q.outputSpanV).toBe(300);
  });

  it('when a signal crossing many codes is rounded to the LSB, then the error has standard deviation LSB/√12 [calc: independent route, simple-statistics]', () => {
    const { lsbNm, noiseNm } = dacQuantisationNm(chain);
    // A slow ramp at an irrational step (golden ratio) samples every position within a step evenly.
    const errors = Array.from({ length: 200_000 }, (_, i) => {
      const x = i * 0.6180339887498949 * lsbNm;
      return Math.round(x / lsbNm) * lsbNm - x;
    });
    expect(standardDeviation(errors) / noiseNm).toBeCloseTo(1, 3);
  });
});

describe('total noise, independent sources added in power [calc]', () => {
  it('when 3 and 4 are added, then 5 [calc]', () => {
    expect(rootSumSquare([3, 4])).toBe(5);
  });

  it('when three terms are added, then the total equals Math.hypot and √n·rms from simple-statistics [calc: independent route]', () => {
    const terms = [0.3, 0.14, 0.2];
    expect(rootSumSquare(terms)).toBeCloseTo(Math.hypot(...terms), 14);
    expect(rootSumSquare(terms)).toBeCloseTo(Math.sqrt(terms.length) * rootMeanSquare(terms), 14);
  });
});

describe('noise-floor calculator', () => {
  const all = { ...chain, noiseDensityVPerRtHz: 1e-6, bandwidthHz: 1e4, cantileverStiffnessNPerM: 0.1, temperatureK: 295 };

  it('when all three terms are given, then each follows by hand, the total is their RSS and the amplifier dominates [calc]', () => {
    const r = compute(all);
    const amp = 1e-6 * 100 * 30 * 102.6;
    const dac = (102.6 * 300) / 2 ** 16 / Math.sqrt(12);
    const thermal = Math.sqrt((1.380649e-23 * 295) / 0.1) * 1e9;
    expect(r.amplifierNoiseNm).toBeCloseTo(amp, 12);
    expect(r.dacQuantisationNoiseNm).toBeCloseTo(dac, 12);
    expect(r.thermalNoiseNm).toBeCloseTo(thermal, 12);
    expect(r.totalNoiseNm).toBeCloseTo(Math.sqrt(amp ** 2 + dac ** 2 + thermal ** 2), 12);
    expect(r.dominant).toBe('amplifier');
    expect(r.dominantPowerSharePct).toBeCloseTo((100 * amp ** 2) / (amp ** 2 + dac ** 2 + thermal ** 2), 9);
    expect(r.terms.reduce((s, t) => s + t.powerSharePct, 0)).toBeCloseTo(100, 12);
  });

  it('when only the lever is given, then thermal dominates, the total is 0.20 nm and no voltage means no cautions [calc]', () => {
    const r = compute({ actuatorGainNmPerV: 102.6, cantileverStiffnessNPerM: 0.1, temperatureK: 295 });
    expect(r.dominant).toBe('thermal');
    expect(r.totalNoiseNm).toBeCloseTo(0.2, 2);
    expect([r.amplifierNoiseNm, r.dacLsbNm]).toEqual([null, null]);
    expect(r.cautions).toEqual([]);
  });

  it('when the DAC drives 300 V, then the IEC 61010-1 cautions show; alone it dominates and warns quantisation_at_rest [S: IEC 61010-1; Bennett 1948]', () => {
    const r = compute(chain);
    expect(r.cautions.map((c) => c.id)).toContain('levels');
    expect(r.dominant).toBe('dac');
    expect(r.warnings.map((w) => w.code)).toEqual(['quantisation_at_rest']);
  });

  it('when a term is half given, or none is, then it is refused with a RangeError', () => {
    expect(() => compute({ actuatorGainNmPerV: 100 })).toThrow(RangeError);
    expect(() => compute({ actuatorGainNmPerV: 100, ampGainVPerV: 30, noiseDensityVPerRtHz: 1e-6 })).toThrow(RangeError);
    expect(() => compute({ actuatorGainNmPerV: 100, dacBits: 16, dacSpanV: 10 })).toThrow(/amplifier gain/);
    expect(() => compute({ actuatorGainNmPerV: 100, cantileverStiffnessNPerM: 0.1 })).toThrow(/temperature/);
  });

  it('when the bits are fractional or the gain is missing, then the schema refuses it', () => {
    expect(noiseFloorInput.safeParse({ ...chain, dacBits: 15.5 }).success).toBe(false);
    expect(noiseFloorInput.safeParse({ cantileverStiffnessNPerM: 0.1, temperatureK: 295 }).success).toBe(false);
  });
});
