import { describe, expect, it } from 'vitest';
import { materials } from '@shared/workbench/materials.ts';
import {
  CANTILEVER_EFFECTIVE_MASS_FRACTION,
  CANTILEVER_LAMBDA1,
  cantileverFirstModeHz,
  cantileverSpringConstantNPerM,
  rectangularBeamMassKg,
  rectangularCantileverHz,
  tipMassCorrectedHz,
} from '@shared/workbench/resonance.ts';

// Silicon E 169 GPa, ρ 2329 kg/m³ [memory] (FIELD.md).
const siliconLever = { lengthM: 125e-6, widthM: 30e-6, thicknessM: 4e-6, youngsModulusPa: 169e9, densityKgPerM3: 2329 };
const pzt5aBar = {
  lengthM: 12e-3,
  thicknessM: 0.6e-3,
  youngsModulusPa: materials['PZT-5A'].youngsModulusGpa * 1e9,
  densityKgPerM3: materials['PZT-5A'].densityKgPerM3,
};

describe('cantilever first mode [S: Rao, Mechanical Vibrations; Timoshenko, Vibration Problems in Engineering]', () => {
  it('when λ1 is used, then cos λ·cosh λ = −1 and it rounds to 1.8751 [calc]', () => {
    expect(Math.cos(CANTILEVER_LAMBDA1) * Math.cosh(CANTILEVER_LAMBDA1)).toBeCloseTo(-1, 13);
    expect(CANTILEVER_LAMBDA1).toBeCloseTo(1.8751, 4);
  });

  it('when the rectangular shortcut is formed, then its constant is 0.1615', () => {
    expect(CANTILEVER_LAMBDA1 ** 2 / (2 * Math.PI) / Math.sqrt(12)).toBeCloseTo(0.1615, 4);
  });

  it('when a PZT-5A bar 12 × 0.6 mm is clamped, then f1 = 1.89 kHz [calc]', () => {
    expect(rectangularCantileverHz(pzt5aBar) / 1e3).toBeCloseTo(1.89, 2);
  });

  it('when a silicon lever 125 × 30 × 4 µm is clamped, then f1 = 352 kHz and k = 41.5 N/m [calc]', () => {
    expect(rectangularCantileverHz(siliconLever) / 1e3).toBeCloseTo(352, 0);
    expect(cantileverSpringConstantNPerM(siliconLever)).toBeCloseTo(41.5, 1);
  });

  it('when the general formula gets I = w·t³/12 and A = w·t, then it equals the rectangular shortcut [calc]', () => {
    const { widthM: w, thicknessM: t } = siliconLever;
    const general = cantileverFirstModeHz({
      youngsModulusPa: siliconLever.youngsModulusPa,
      secondMomentM4: (w * t ** 3) / 12,
      densityKgPerM3: siliconLever.densityKgPerM3,
      areaM2: w * t,
      lengthM: siliconLever.lengthM,
    });
    expect(general / rectangularCantileverHz(siliconLever)).toBeCloseTo(1, 13);
  });
});

describe('tip mass [calc: effective mass 3m/1.8751⁴ = 0.2427m]', () => {
  it('when the fraction is formed, then it is 0.2427', () => {
    expect(CANTILEVER_EFFECTIVE_MASS_FRACTION).toBeCloseTo(0.2427, 4);
  });

  it('when f1 = √(k/m_eff)/2π is formed from k = 3EI/L³, then it equals the beam formula', () => {
    const k = cantileverSpringConstantNPerM(siliconLever);
    const mEff = CANTILEVER_EFFECTIVE_MASS_FRACTION * rectangularBeamMassKg(siliconLever);
    expect(Math.sqrt(k / mEff) / (2 * Math.PI) / rectangularCantileverHz(siliconLever)).toBeCloseTo(1, 12);
  });

  it('when the tip mass equals the effective mass, then the frequency falls by √2; with none it is unchanged', () => {
    const m = rectangularBeamMassKg(siliconLever);
    expect(tipMassCorrectedHz(1000, m, CANTILEVER_EFFECTIVE_MASS_FRACTION * m)).toBeCloseTo(1000 / Math.SQRT2, 10);
    expect(tipMassCorrectedHz(1000, m, 0)).toBe(1000);
  });
});
