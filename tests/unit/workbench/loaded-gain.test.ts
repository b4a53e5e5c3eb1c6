import { describe, expect, it } from 'vitest';
import { loadedGainInput } from '@shared/schemas/workbench-extras.ts';
import { loadedGainCalculator } from '@shared/workbench/calculators/loaded-gain-calculator.ts';
import { benderStiffnessNPerM, loadedGain, preloadDeflectionNm } from '@shared/workbench/loaded-gain.ts';
import { CANTILEVER_EFFECTIVE_MASS_FRACTION, rectangularBeamMassKg, rectangularCantileverHz } from '@shared/workbench/resonance.ts';

const compute = (body: unknown) => loadedGainCalculator.compute(loadedGainInput.parse(body));

// PZT-5A bar of FIELD.md's resonance check, 2 mm wide (E 61.0 GPa, ρ 7750 kg/m³ [S: Erturk & Inman 2011, App. E]).
const bender = { lengthM: 12e-3, widthM: 2e-3, thicknessM: 0.6e-3, youngsModulusPa: 61e9 };

/** Golden-section search for the minimum of a unimodal f on [a, b]. */
function minimise(f: (x: number) => number, a: number, b: number): number {
  const r = (Math.sqrt(5) - 1) / 2;
  let [lo, hi] = [a, b];
  for (let i = 0; i < 200; i++) {
    const x1 = hi - r * (hi - lo);
    const x2 = lo + r * (hi - lo);
    if (f(x1) < f(x2)) hi = x2;
    else lo = x1;
  }
  return (lo + hi) / 2;
}

describe('loaded gain g·kₐ/(kₐ + kₛ) [memory, FIELD.md; derivation calc]', () => {
  it('when 100 nm/V works against a spring a quarter as stiff (1000 vs 250 N/m), then 80 nm/V and 20 % lost [calc]', () => {
    const r = loadedGain(100, 1000, 250);
    expect(r.loadedGainNmPerV).toBeCloseTo((100 * 1000) / 1250, 12);
    expect(r.gainLossPct).toBeCloseTo(20, 12);
  });

  it('when the tip position minimises the energy of both springs, then it lands on the formula [calc: independent route]', () => {
    const [ka, ks, freeNm] = [3812, 420, 102.6];
    // A stroke δ₀ behind kₐ against kₛ: U(δ) = ½kₐ(δ₀ − δ)² + ½kₛδ², at rest where U is least.
    const energy = (d: number) => 0.5 * ka * (freeNm - d) ** 2 + 0.5 * ks * d ** 2;
    const restNm = minimise(energy, 0, freeNm);
    expect(restNm / loadedGain(freeNm, ka, ks).loadedGainNmPerV).toBeCloseTo(1, 7);
  });

  it('when there is no spring, then nothing is lost [calc]', () => {
    expect(loadedGain(102.6, 3812, 0)).toEqual({ loadedGainNmPerV: 102.6, gainLossPct: 0 });
  });

  it('when a stiffness is zero or negative, then it is refused with a RangeError', () => {
    expect(() => loadedGain(100, 0, 10)).toThrow(RangeError);
    expect(() => loadedGain(100, 1000, -1)).toThrow(RangeError);
    expect(() => loadedGain(-5, 1000, 10)).toThrow(RangeError);
  });
});

describe('bender stiffness k = E·w·t³/(4L³) [S: Timoshenko; FIELD.md check]', () => {
  it('when the silicon lever of FIELD.md (125 × 30 × 4 µm, E 169 GPa) is used, then k = 41.5 N/m [calc]', () => {
    expect(benderStiffnessNPerM({ lengthM: 125e-6, widthM: 30e-6, thicknessM: 4e-6, youngsModulusPa: 169e9 })).toBeCloseTo(41.5, 1);
  });

  it('when the 12 × 2 × 0.6 mm PZT-5A bar is used, then k = 61e9·2e-3·(0.6e-3)³/(4·(12e-3)³) [calc]', () => {
    expect(benderStiffnessNPerM(bender)).toBeCloseTo((61e9 * 2e-3 * 0.6e-3 ** 3) / (4 * 12e-3 ** 3), 9);
  });

  it('when k is formed from the first mode and the effective mass, k = 0.2427·m·(2πf₁)², then it agrees [calc: independent route]', () => {
    const beam = { ...bender, densityKgPerM3: 7750 };
    const k = CANTILEVER_EFFECTIVE_MASS_FRACTION * rectangularBeamMassKg(beam) * (2 * Math.PI * rectangularCantileverHz(beam)) ** 2;
    expect(k / benderStiffnessNPerM(bender)).toBeCloseTo(1, 12);
  });
});

describe('preload deflection F/kₐ [calc]', () => {
  it('when an indicator presses with 1 N on 4000 N/m, then the actuator gives 250 µm [calc]', () => {
    expect(preloadDeflectionNm(1, 4000)).toBeCloseTo(250_000, 6);
  });

  it('when the force is negative, then it is refused', () => {
    expect(() => preloadDeflectionNm(-1, 4000)).toThrow(RangeError);
  });
});

describe('loaded-gain calculator', () => {
  it('when a bender meets a 100 N/m indicator with 1 N preload, then stiffness, gain and deflection follow by hand [calc]', () => {
    const ka = (61e9 * 2e-3 * 0.6e-3 ** 3) / (4 * 12e-3 ** 3);
    const r = compute({ freeGainNmPerV: 102.6, bender, springRateNPerM: 100, preloadForceN: 1 });
    expect(r.stiffnessFromBender).toBe(true);
    expect(r.actuatorStiffnessNPerM).toBeCloseTo(ka, 9);
    expect(r.loadedGainNmPerV).toBeCloseTo((102.6 * ka) / (ka + 100), 10);
    expect(r.gainLossPct).toBeCloseTo((100 * 100) / (ka + 100), 10);
    expect(r.preloadDeflectionNm).toBeCloseTo((1 / ka) * 1e9, 6);
    expect(r.warnings).toEqual([]);
    expect(r.cautions).toEqual([]);
  });

  it('when the spring is stiffer than the actuator, then it warns; at equal stiffness (50 %) it does not [calc]', () => {
    const stiff = compute({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 100, springRateNPerM: 300 });
    expect(stiff.loadedGainNmPerV).toBeCloseTo(25, 12);
    expect(stiff.warnings.map((w) => w.code)).toEqual(['spring_stiffer_than_actuator']);
    const equal = compute({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 100, springRateNPerM: 100 });
    expect(equal.gainLossPct).toBeCloseTo(50, 12);
    expect(equal.warnings).toEqual([]);
  });

  it('when no preload is given, then its deflection is null', () => {
    expect(compute({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, springRateNPerM: 10 }).preloadDeflectionNm).toBeNull();
  });

  it('when both a stiffness and a bender, or neither, are given, then it is refused with a RangeError', () => {
    expect(() => compute({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, bender, springRateNPerM: 10 })).toThrow(RangeError);
    expect(() => compute({ freeGainNmPerV: 100, springRateNPerM: 10 })).toThrow(RangeError);
  });

  it('when the body has an unknown field or a negative spring rate, then the schema refuses it', () => {
    expect(loadedGainInput.safeParse({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, springRateNPerM: 10, extra: 1 }).success).toBe(
      false,
    );
    expect(loadedGainInput.safeParse({ freeGainNmPerV: 100, actuatorStiffnessNPerM: 1000, springRateNPerM: -1 }).success).toBe(false);
  });
});
