import { describe, expect, it } from 'vitest';
import {
  bimorphParallelGain,
  bimorphSeriesGain,
  expectedGain,
  loadedGainNmPerV,
  measuredToExpectedRatio,
  plateLengthGain,
  plateThicknessGain,
  shearPlateGain,
  stackGain,
  tubeAxialGain,
  tubeOppositePairGain,
  tubeQuadrantGain,
} from '@shared/workbench/expected-gain.ts';
import { MATERIAL_BAND_FRACTION, materialKeys, materials } from '@shared/workbench/materials.ts';

const bar = { lengthMm: 12, thicknessMm: 0.6 };
const tube = { lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508 };

describe('materials [S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E; PZT-4/PZT-8 [memory]]', () => {
  it('when the table is read, then each row carries its FIELD.md tag', () => {
    expect(materials['PZT-5A'].source).toBe('[S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E]');
    expect(materials['PZT-5H'].source).toBe('[S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E]');
    expect(materials['PZT-4'].source).toBe('[memory]');
    expect(materials['PZT-8'].source).toBe('[memory]');
    expect(MATERIAL_BAND_FRACTION).toBe(0.2);
  });

  it.each(materialKeys)('when %s is read, then Y = 1/s11E to the printed 0.1 GPa [calc]', (key) => {
    const m = materials[key];
    expect(1 / m.s11EM2PerN / 1e9).toBeCloseTo(m.youngsModulusGpa, 1);
    expect(m.d31PmPerV).toBeLessThan(0);
  });
});

describe('expected gain, FIELD.md check values [calc]', () => {
  it('when a 1 mm PZT-5A plate works in thickness mode, then 0.374 nm/V', () => {
    expect(plateThicknessGain('PZT-5A').gainNmPerV).toBeCloseTo(0.374, 3);
  });

  it('when a stack has 200 layers of d33 593 pm/V, then 118.6 nm/V [S: Murata piezo actuator basics]', () => {
    expect(stackGain({ d33PmPerV: 593 }, { layers: 200 }).gainNmPerV).toBeCloseTo(118.6, 1);
    expect(stackGain('PZT-5H', { layers: 200 }).gainNmPerV).toBeCloseTo(118.6, 1);
  });

  it('when a PZT-5A shear plate is driven, then 0.584 nm/V', () => {
    expect(shearPlateGain('PZT-5A').gainNmPerV).toBeCloseTo(0.584, 3);
  });

  it('when a PZT-5A bimorph 12 × 0.6 mm is driven in series, then 102.6 nm/V [S: Smits, Dalke & Cooney 1991]', () => {
    expect(bimorphSeriesGain('PZT-5A', bar).gainNmPerV).toBeCloseTo(102.6, 1);
  });

  it('when the same bar is driven in parallel, then 205.2 nm/V [S: Smits, Dalke & Cooney 1991]', () => {
    expect(bimorphParallelGain('PZT-5A', bar).gainNmPerV).toBeCloseTo(205.2, 1);
  });

  it('when a PZT-5H tube 12.7 × 6.35 × 0.508 mm has one quadrant driven, then 6.70 nm/V [S: C. J. Chen, APL 60, 132 (1992); FIELD check value]', () => {
    expect(tubeQuadrantGain('PZT-5H', tube).gainNmPerV).toBeCloseTo(6.7, 2);
  });

  it('when opposite quadrants get ±V, then 13.4 nm/V, twice one quadrant [S: Chen 1992]', () => {
    expect(tubeOppositePairGain('PZT-5H', tube).gainNmPerV).toBeCloseTo(13.4, 1);
    expect(tubeOppositePairGain('PZT-5H', tube).gainNmPerV).toBeCloseTo(2 * tubeQuadrantGain('PZT-5H', tube).gainNmPerV, 12);
  });

  it('when the bending of one quadrant is derived from beam theory, then it matches the formula [calc]', () => {
    // Thin-walled tube of mean radius R and wall h; a free strain ε0 on the quadrant −45°…45°.
    // Moment about the neutral axis M = E·h·R²·ε0·∫cos θ dθ; I = π·R³·h; curvature M/(E·I); δ = curvature·L²/2.
    const d31 = 274e-12;
    const h = tube.wallMm * 1e-3;
    const r = ((tube.outerDiameterMm - tube.wallMm) / 2) * 1e-3;
    const l = tube.lengthMm * 1e-3;
    const eps0 = d31 / h; // per volt
    const steps = 2000;
    let integral = 0; // Simpson's rule for ∫cos θ over the quadrant
    for (let i = 0; i <= steps; i++) {
      const theta = -Math.PI / 4 + (i * Math.PI) / 2 / steps;
      const w = i === 0 || i === steps ? 1 : i % 2 === 1 ? 4 : 2;
      integral += w * Math.cos(theta);
    }
    integral *= Math.PI / 2 / steps / 3;
    const curvature = (h * r * r * eps0 * integral) / (Math.PI * r ** 3 * h);
    const deflectionNmPerV = ((curvature * l * l) / 2) * 1e9;
    expect(tubeQuadrantGain('PZT-5H', tube).gainNmPerV).toBeCloseTo(deflectionNmPerV, 9);
  });

  it('when all quadrants get V, then the tube lengthens by 6.85 nm/V', () => {
    expect(tubeAxialGain('PZT-5H', tube).gainNmPerV).toBeCloseTo(6.85, 2);
  });

  it('when a plate works in length mode, then d31·L/t (no FIELD check value; hand value [calc])', () => {
    expect(plateLengthGain('PZT-5A', { lengthMm: 10, thicknessMm: 0.5 }).gainNmPerV).toBeCloseTo(0.171 * 20, 12);
  });
});

describe('band, dispatcher and ratio', () => {
  it('when an expected gain is computed, then the band is ±20 %', () => {
    const g = bimorphSeriesGain('PZT-5A', bar);
    expect(g.lowNmPerV).toBeCloseTo(g.gainNmPerV * 0.8, 12);
    expect(g.highNmPerV).toBeCloseTo(g.gainNmPerV * 1.2, 12);
  });

  it('when the dispatcher is used, then it matches the direct call', () => {
    expect(expectedGain({ actuator: 'bimorph-series', material: 'PZT-5A', ...bar })).toEqual(bimorphSeriesGain('PZT-5A', bar));
    expect(expectedGain({ actuator: 'tube-opposite-pair', material: 'PZT-5H', ...tube })).toEqual(tubeOppositePairGain('PZT-5H', tube));
    expect(expectedGain({ actuator: 'shear-plate', material: 'PZT-5A', plates: 2 }).gainNmPerV).toBeCloseTo(1.168, 12);
  });

  it('when measured is 90 nm/V against 102.6 expected, then the ratio is 0.877 and inside the band [calc]', () => {
    const r = measuredToExpectedRatio(-90, bimorphSeriesGain('PZT-5A', bar));
    expect(r.ratio).toBeCloseTo(90 / 102.6, 12);
    expect(r.withinBand).toBe(true);
    expect(measuredToExpectedRatio(50, bimorphSeriesGain('PZT-5A', bar)).withinBand).toBe(false);
  });

  it('when the custom constants lack the one needed, then it throws', () => {
    expect(() => bimorphSeriesGain({ d33PmPerV: 400 }, bar)).toThrow(RangeError);
    expect(() => tubeQuadrantGain('PZT-5H', { ...tube, wallMm: 4 })).toThrow(RangeError);
    expect(() => tubeAxialGain('PZT-5H', { ...tube, wallMm: tube.outerDiameterMm / 2 })).toThrow(/half the outer diameter/);
  });

  it('when loaded by a spring as stiff as the actuator, then half the free gain [memory]', () => {
    expect(loadedGainNmPerV(100, 5e6, 5e6)).toBe(50);
  });
});
