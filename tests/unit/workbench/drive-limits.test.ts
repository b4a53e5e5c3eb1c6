import { describe, expect, it } from 'vitest';
import { driveLimitsInput } from '@shared/schemas/workbench-extras.ts';
import { driveLimitsCalculator } from '@shared/workbench/calculators/drive-limits-calculator.ts';
import { driveCurrent } from '@shared/workbench/drive-current.ts';
import {
  capacitiveCurrentA,
  currentLimitedLineRateHz,
  currentLimitedSineHz,
  rcAmplitudeRatio,
  rcCornerHz,
  sineSlewRateVPerS,
  slewLimitedLineRateHz,
  slewLimitedSineHz,
  triangleSlewRateVPerS,
} from '@shared/workbench/drive-limits.ts';

const compute = (body: unknown) => driveLimitsCalculator.compute(driveLimitsInput.parse(body));
const fieldDrive = { capacitanceF: 3.4e-9, amplitudeV: 100, frequencyHz: 1000 };

/** Largest |ΔV/Δt| of a waveform sampled n times over one period. */
function steepestSlope(v: (t: number) => number, periodS: number, n = 100_000): number {
  const dt = periodS / n;
  let max = 0;
  for (let i = 0; i < n; i++) max = Math.max(max, Math.abs(v((i + 1) * dt) - v(i * dt)) / dt);
  return max;
}

describe('sine drive: slew 2π·f·V_pk and current C·dV/dt [calc]', () => {
  it('when 3.4 nF is driven at 100 V, 1 kHz, then the peak current is 2.1 mA [calc, FIELD.md check]', () => {
    const i = capacitiveCurrentA(3.4e-9, sineSlewRateVPerS(100, 1000));
    expect(i * 1e3).toBeCloseTo(2.1, 1);
    expect(i / driveCurrent(fieldDrive).peakCurrentA).toBeCloseTo(1, 12);
  });

  it('when the sine is sampled and differenced, then its steepest slope is 2π·f·V_pk [calc: independent route]', () => {
    const slope = steepestSlope((t) => 100 * Math.sin(2 * Math.PI * 1000 * t), 1e-3);
    expect(slope / sineSlewRateVPerS(100, 1000)).toBeCloseTo(1, 6);
  });

  it('when the current limit is 10 mA, then f_max = 0.01/(2π·3.4 nF·100 V) and drives exactly 10 mA there [calc]', () => {
    const fMax = currentLimitedSineHz(0.01, 3.4e-9, 100);
    expect(fMax).toBeCloseTo(0.01 / (2 * Math.PI * 3.4e-9 * 100), 6);
    expect(driveCurrent({ ...fieldDrive, frequencyHz: fMax }).peakCurrentA).toBeCloseTo(0.01, 14);
  });

  it('when the slew rate is 1 V/µs at 100 V, then f_max = 1e6/(2π·100) ≈ 1.59 kHz [calc]', () => {
    expect(slewLimitedSineHz(1e6, 100)).toBeCloseTo(1e6 / (2 * Math.PI * 100), 9);
    expect(sineSlewRateVPerS(100, slewLimitedSineHz(1e6, 100))).toBeCloseTo(1e6, 6);
  });
});

describe('triangle raster: slew 2·V_pp·f, trace and retrace in one line period [calc]', () => {
  it('when 200 V p-p runs at 50 lines/s, then 20 kV/s and 68 µA into 3.4 nF [calc]', () => {
    expect(triangleSlewRateVPerS(200, 50)).toBe(2 * 200 * 50);
    expect(capacitiveCurrentA(3.4e-9, triangleSlewRateVPerS(200, 50))).toBeCloseTo(3.4e-9 * 20_000, 15);
  });

  it('when a triangle is sampled and differenced, then its slope is 2·V_pp·f [calc: independent route]', () => {
    const [vpp, f] = [200, 50];
    const tri = (t: number) => {
      const phase = (t * f) % 1;
      return phase < 0.5 ? vpp * 2 * phase : vpp * (2 - 2 * phase);
    };
    expect(steepestSlope(tri, 1 / f, 10_000) / triangleSlewRateVPerS(vpp, f)).toBeCloseTo(1, 9);
  });

  it('when limits are 1 mA and 1 V/µs at 200 V p-p, then line rates 1e-3/(2·C·200) and 1e6/400 [calc]', () => {
    expect(currentLimitedLineRateHz(1e-3, 3.4e-9, 200)).toBeCloseTo(1e-3 / (2 * 3.4e-9 * 200), 9);
    expect(slewLimitedLineRateHz(1e6, 200)).toBe(2500);
  });
});

describe('RC corner f_c = 1/(2π·R_out·C) [calc; first-order low-pass]', () => {
  it('when 1 kΩ drives 3.4 nF, then f_c = 1/(2π·1e3·3.4e-9) ≈ 46.8 kHz and 1/√2 is left there [calc]', () => {
    const fc = rcCornerHz(1000, 3.4e-9);
    expect(fc).toBeCloseTo(1 / (2 * Math.PI * 1000 * 3.4e-9), 6);
    expect(rcAmplitudeRatio(fc, fc)).toBeCloseTo(Math.SQRT1_2, 14);
  });

  it('when the RC circuit is stepped in time with a sine at f_c, then the settled amplitude is 1/√2 [calc: independent route, RK4]', () => {
    const [r, c] = [1000, 3.4e-9];
    const fc = rcCornerHz(r, c);
    const w = 2 * Math.PI * fc;
    const dvdt = (t: number, v: number) => (Math.sin(w * t) - v) / (r * c);
    const stepsPerPeriod = 2000;
    const h = 1 / fc / stepsPerPeriod;
    let [t, v, peak] = [0, 0, 0];
    for (let i = 0; i < 20 * stepsPerPeriod; i++) {
      const k1 = dvdt(t, v);
      const k2 = dvdt(t + h / 2, v + (h / 2) * k1);
      const k3 = dvdt(t + h / 2, v + (h / 2) * k2);
      const k4 = dvdt(t + h, v + h * k3);
      v += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      t += h;
      if (i >= 19 * stepsPerPeriod) peak = Math.max(peak, Math.abs(v));
    }
    expect(peak / rcAmplitudeRatio(fc, fc)).toBeCloseTo(1, 5);
  });
});

describe('drive-limits calculator', () => {
  it("when FIELD.md's drive is entered alone, then 2.1 mA, no limits, and the high-voltage cautions [calc; S: IEC 61010-1]", () => {
    const r = compute(fieldDrive);
    expect(r.sinePeakCurrentA * 1e3).toBeCloseTo(2.1, 1);
    expect(r.sineSlewRateVPerS).toBeCloseTo(2 * Math.PI * 1000 * 100, 9);
    expect([r.rasterSlewRateVPerS, r.currentLimitedMaxHz, r.slewLimitedMaxHz, r.rcCornerHz]).toEqual([null, null, null, null]);
    expect(r.warnings).toEqual([]);
    expect(r.cautions.map((c) => c.id)).toContain('levels'); // 100 V peak > 42.4 V peak
  });

  it('when a 1 mA amplifier is asked for 1 kHz, then it warns sine_over_current_limit (limit 468 Hz) [calc]', () => {
    const r = compute({ ...fieldDrive, currentLimitA: 1e-3 });
    expect(r.currentLimitedMaxHz).toBeCloseTo(1e-3 / (2 * Math.PI * 3.4e-9 * 100), 9);
    expect(r.warnings.map((w) => w.code)).toEqual(['sine_over_current_limit']);
  });

  it('when every limit is generous, then nothing warns; when each is tight, each warns once [calc]', () => {
    const body = { ...fieldDrive, rasterSwingPpV: 200, lineRateHz: 100 };
    expect(compute({ ...body, currentLimitA: 0.1, slewRateVPerS: 1e8, outputResistanceOhm: 10 }).warnings).toEqual([]);
    const tight = compute({ ...body, currentLimitA: 1e-5, slewRateVPerS: 1e4, outputResistanceOhm: 1e6 });
    expect(tight.warnings.map((w) => w.code).sort()).toEqual(
      ['above_rc_corner', 'raster_over_current_limit', 'raster_over_slew_limit', 'sine_over_current_limit', 'sine_over_slew_limit'].sort(),
    );
  });

  it('when a small drive stays below the IEC 61010-1 levels, then there are no cautions; 1 µF at 150 V trips stored charge [S: IEC 61010-1, 6.3.1]', () => {
    expect(compute({ capacitanceF: 3.4e-9, amplitudeV: 10, frequencyHz: 1000 }).cautions).toEqual([]);
    const big = compute({ capacitanceF: 1e-6, amplitudeV: 150, frequencyHz: 10 });
    expect(big.storedChargeC).toBeCloseTo(150e-6, 15);
    expect(big.cautions.map((c) => c.id)).toContain('discharge');
  });

  it('when a raster swing comes without a line rate, then it is refused with a RangeError', () => {
    expect(() => compute({ ...fieldDrive, rasterSwingPpV: 200 })).toThrow(RangeError);
  });

  it('when the capacitance is zero or a field is unknown, then the schema refuses it', () => {
    expect(driveLimitsInput.safeParse({ ...fieldDrive, capacitanceF: 0 }).success).toBe(false);
    expect(driveLimitsInput.safeParse({ ...fieldDrive, gain: 20 }).success).toBe(false);
  });
});
