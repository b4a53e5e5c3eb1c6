import { describe, expect, it } from 'vitest';
import { creepCalculator } from '@shared/workbench/calculators/creep-calculator.ts';
import { expectedGainCalculator } from '@shared/workbench/calculators/expected-gain-calculator.ts';
import { peakToPeakCalculator } from '@shared/workbench/calculators/peak-to-peak-calculator.ts';
import { resonanceCalculator } from '@shared/workbench/calculators/resonance-calculator.ts';
import { convertCalculator } from '@shared/workbench/calculators/simple-calculators.ts';
import { fitCalculator } from '@shared/workbench/calculators/fit-calculator.ts';
import { expectedGain } from '@shared/workbench/expected-gain.ts';
import { expectedGainTolerance } from '@shared/workbench/gain-tolerance.ts';
import { sourceInWords } from '@shared/workbench/source-words.ts';

describe('resonance calculator', () => {
  const bar = { lengthM: 12e-3, thicknessM: 0.6e-3, widthM: 2e-3, youngsModulusPa: 61e9, densityKgPerM3: 7750 };

  it('when a tip mass is given, then the line-rate ceilings are f/10 and f/100 of the loaded mode, not the bare beam [S: Bae & Granick 2000; practice]', () => {
    // Beam mass 12 × 2 × 0.6 mm³ × 7750 kg/m³ = 111.6 mg; tip 100 mg: f = f1·√(0.2427m/(0.2427m + M)) [calc].
    const r = resonanceCalculator.compute({ ...bar, tipMassKg: 100e-6 });
    const m = 7750 * 12e-3 * 2e-3 * 0.6e-3;
    const meff = (3 / 1.875104068711961 ** 4) * m;
    const loaded = r.firstModeHz * Math.sqrt(meff / (meff + 100e-6));
    expect(r.withTipMassHz).toBeCloseTo(loaded, 9);
    expect(r.lineRateCeilingSineLikeHz).toBeCloseTo(loaded / 10, 9);
    expect(r.lineRateCeilingTriangleHz).toBeCloseTo(loaded / 100, 9);
    expect(r.firstModeHz / loaded).toBeGreaterThan(2); // the bare beam would be over twice too permissive here
  });

  it('when there is no tip mass, then the ceilings follow the bare first mode (1.89 kHz for the 12 × 0.6 mm PZT-5A bar [calc; S: Rao, Timoshenko])', () => {
    const r = resonanceCalculator.compute(bar);
    expect(r.firstModeHz).toBeCloseTo(1890, -1);
    expect(r.lineRateCeilingSineLikeHz).toBeCloseTo(r.firstModeHz / 10, 9);
    expect(r.warnings).toEqual([]);
  });

  it('when the bar is shorter than 10 thicknesses, then a thick-beam warning says f₁ is overestimated [practice]', () => {
    const r = resonanceCalculator.compute({ ...bar, lengthM: 5e-3, thicknessM: 1e-3 });
    expect(r.warnings.map((w) => w.code)).toEqual(['thick_beam']);
    expect(r.warnings[0].message).toMatch(/overestimates/);
  });
});

describe('peak-to-peak calculator', () => {
  it('when the swing is under two divisions, then it warns that the figure carries little information [practice; FIELD.md]', () => {
    const r = peakToPeakCalculator.compute({ displacementPpNm: 15, voltsPpV: 10, displacementResolutionNm: 10 });
    expect(r.warnings.map((w) => w.code)).toEqual(['few_divisions']);
    expect(r.warnings[0].message).toMatch(/little information/);
  });

  it('when the swing is 200 divisions, then no warning, and the worst case is each reading off by half a division [S: GUM 4.3.7]', () => {
    const r = peakToPeakCalculator.compute({ displacementPpNm: 2000, voltsPpV: 20, displacementResolutionNm: 10 });
    expect(r.warnings).toEqual([]);
    expect(r.gainBoundsNmPerV[0]).toBeCloseTo((2000 - 2 * 5) / 20, 12);
    expect(r.gainBoundsNmPerV[1]).toBeCloseTo((2000 + 2 * 5) / 20, 12);
  });

  it('when the drive swings 50 V peak-to-peak, then the cautions show (the peak may reach the swing on an offset) [S: IEC 61010-1 — memory for the clause]', () => {
    expect(peakToPeakCalculator.compute({ displacementPpNm: 5000, voltsPpV: 50, displacementResolutionNm: 10 }).cautions[0].id).toBe(
      'levels',
    );
    expect(peakToPeakCalculator.compute({ displacementPpNm: 5000, voltsPpV: 20, displacementResolutionNm: 10 }).cautions).toEqual([]);
  });
});

describe('fit calculator cautions', () => {
  it('when calibration steps reach 75 V DC, then the cautions name the 60 V DC level; 50 V steps show none [S: IEC 61010-1 — memory for the clause]', () => {
    const pts = (top: number) => [0, top / 2, top].map((v) => ({ volts: v, displacement: 100 * v }));
    const high = fitCalculator.compute({ points: pts(75), voltageUnit: 'V', displacementUnit: 'nm', model: 'intercept' });
    expect(high.levelsCrossed).toEqual(['75 V DC is above the 60 V DC level']);
    expect(fitCalculator.compute({ points: pts(50), voltageUnit: 'V', displacementUnit: 'nm', model: 'intercept' }).cautions).toEqual([]);
  });
});

describe('creep calculator', () => {
  const record = (gamma: number) => [0.1, 1, 10, 100].map((t) => ({ timeS: t, displacementNm: 1000 * (1 + gamma * Math.log10(t / 0.1)) }));

  it('when γ is 0.015, then no warning and +4.5 % by 100 s [S: PI catalogue 1998–2006; calc]', () => {
    const r = creepCalculator.compute({ samples: record(0.015) });
    expect(r.gamma).toBeCloseTo(0.015, 12);
    expect(r.creepAt100sPct).toBeCloseTo(4.5, 10);
    expect(r.warnings).toEqual([]);
  });

  it('when γ is negative or far above 0.02, then the result warns instead of projecting silently [practice]', () => {
    expect(creepCalculator.compute({ samples: record(-0.3) }).warnings.map((w) => w.code)).toEqual(['gamma_negative']);
    expect(creepCalculator.compute({ samples: record(0.2) }).warnings.map((w) => w.code)).toEqual(['gamma_atypical']);
  });

  it('when a projection time is asked, then it is added to 10, 100 and 1000 s and the curve reaches it', () => {
    const r = creepCalculator.compute({ samples: record(0.015), projectToS: 3600 });
    expect(r.projections.map((p) => p.timeS)).toEqual([10, 100, 1000, 3600]);
    expect(r.curve.at(-1)!.timeS).toBeCloseTo(3600, 6);
  });
});

describe('expected-gain tolerance [S: GUM, JCGM 100:2008, 4.3.7 and 5.1.2]', () => {
  const spec = { actuator: 'bimorph-series' as const, material: 'PZT-5A' as const, lengthMm: 12, thicknessMm: 0.6 };

  it('when L = 12 ± 0.1 mm and h = 0.6 ± 0.01 mm (rectangular), then u_r = √((2·0.1/√3/12)² + (2·0.01/√3/0.6)²) [calc]', () => {
    const t = expectedGainTolerance(spec, { lengthMm: 0.1, thicknessMm: 0.01 });
    const hand = Math.hypot((2 * 0.1) / Math.sqrt(3) / 12, (2 * 0.01) / Math.sqrt(3) / 0.6);
    expect(t.relStdUnc).toBeCloseTo(hand, 12);
  });

  it('when a quartered tube is perturbed by finite differences, then the first-order sensitivities match [calc]', () => {
    const tube = { actuator: 'tube-quadrant' as const, material: 'PZT-5H' as const, lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508 };
    const g0 = expectedGain(tube).gainNmPerV;
    const a = 1e-3;
    for (const field of ['lengthMm', 'outerDiameterMm', 'wallMm'] as const) {
      const h = 1e-6;
      const dlng =
        (Math.log(expectedGain({ ...tube, [field]: tube[field] + h }).gainNmPerV) -
          Math.log(expectedGain({ ...tube, [field]: tube[field] - h }).gainNmPerV)) /
        (2 * h);
      const t = expectedGainTolerance(tube, { [field]: a });
      expect(t.relStdUnc).toBeCloseTo(Math.abs(dlng) * (a / Math.sqrt(3)), 8);
    }
    expect(g0).toBeGreaterThan(0);
  });

  it('when the calculator is given tolerances, then it returns a k = 2 band around the expected gain', () => {
    const r = expectedGainCalculator.compute({ ...spec, tolerances: { lengthMm: 0.1, thicknessMm: 0.01 } });
    expect(r.tolerance!.coverageK).toBe(2);
    expect(r.tolerance!.highNmPerV - r.gainNmPerV).toBeCloseTo(2 * r.tolerance!.gainStdUncNmPerV, 9);
    expect(r.gainNmPerV).toBeCloseTo(102.6, 1);
  });
});

describe('unit converter', () => {
  it('when 1 µin/V is converted, then it is 25.4 nm/V and 254 Å/V [S: NBS Circular 572 addendum, 1960; calc]', () => {
    const r = convertCalculator.compute({ value: 1, from: 'uin/V', to: 'nm/V' });
    expect(r.converted).toBe(25.4);
    expect(r.inEveryUnit.find((u) => u.unit === 'angstrom/V')!.value).toBeCloseTo(254, 10);
    expect(r.inEveryUnit.find((u) => u.unit === 'um/V')!.value).toBeCloseTo(0.0254, 14);
  });

  it('when units of different kinds are asked, then it refuses', () => {
    expect(() => convertCalculator.compute({ value: 1, from: 'nm', to: 'nm/V' })).toThrow(RangeError);
  });
});

describe('sources in words', () => {
  it('when a tag is shown, then it reads as words', () => {
    expect(sourceInWords('[S: C. J. Chen, Appl. Phys. Lett. 60, 132 (1992)]')).toBe('Source: C. J. Chen, Appl. Phys. Lett. 60, 132 (1992)');
    expect(sourceInWords('[practice]')).toBe('common practice');
    expect(sourceInWords('[memory]')).toBe('recalled value, not yet checked against a source');
    expect(sourceInWords('x [calc] y')).toBe('x calculated from the formula y');
  });
});
