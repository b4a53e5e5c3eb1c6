import { describe, expect, it } from 'vitest';
import { creepDisplacementNm, creepPct, fitCreep } from '@shared/workbench/creep.ts';
import { peakToPeakGain } from '@shared/workbench/peak-to-peak.ts';
import {
  KAPPA_PER_SQRT_EV_PER_ANGSTROM,
  currentRatioPerAngstrom,
  decayConstantPerAngstrom,
  gapChangePerDecadeAngstrom,
  workFunctionForRatioEv,
} from '@shared/workbench/tunnelling.ts';

describe('tunnelling [memory: 1-D WKB; constants CODATA 2018]', () => {
  it('when the constants are combined, then κ = 0.5123·√(φ/eV) Å⁻¹', () => {
    expect(KAPPA_PER_SQRT_EV_PER_ANGSTROM).toBeCloseTo(0.5123, 4);
  });

  it('when φ = 4 eV, then κ = 1.025 Å⁻¹ and the current changes ×7.8 per Å [calc]', () => {
    expect(decayConstantPerAngstrom(4)).toBeCloseTo(1.025, 3);
    expect(currentRatioPerAngstrom(4)).toBeCloseTo(7.8, 1);
  });

  it('when ×10 per Å is wanted, then φ ≈ 5.05 eV [calc]', () => {
    expect(workFunctionForRatioEv(10)).toBeCloseTo(5.05, 2);
    expect(currentRatioPerAngstrom(workFunctionForRatioEv(10))).toBeCloseTo(10, 12);
  });

  it('when the gap changes by one decade step, then the current changes ×10 [calc]', () => {
    for (const phi of [1, 4, 5.05]) expect(currentRatioPerAngstrom(phi) ** gapChangePerDecadeAngstrom(phi)).toBeCloseTo(10, 12);
  });
});

describe('creep [S: PI catalogue 1998–2006]', () => {
  it('when γ = 0.02 at 100 s, then +6 % [calc]', () => {
    expect(creepPct(0.02, 100)).toBeCloseTo(6, 12);
  });

  it('when a record follows the law exactly, then the fit returns x(0.1 s) and γ [calc]', () => {
    const samples = [0.1, 0.3, 1, 3, 10, 30, 100].map((timeS) => ({ timeS, displacementNm: creepDisplacementNm(1000, 0.015, timeS) }));
    const fit = fitCreep(samples);
    expect(fit.displacementAt0p1sNm).toBeCloseTo(1000, 9);
    expect(fit.gamma).toBeCloseTo(0.015, 12);
    expect(fit.residualStdNm).toBeLessThan(1e-9);
  });

  it('when the record is too short or has one time only, then it throws', () => {
    expect(() =>
      fitCreep([
        { timeS: 1, displacementNm: 1 },
        { timeS: 2, displacementNm: 2 },
      ]),
    ).toThrow(RangeError);
    expect(() => fitCreep([1, 2, 3].map((d) => ({ timeS: 5, displacementNm: d })))).toThrow(RangeError);
    expect(() => fitCreep([0, 1, 2].map((t) => ({ timeS: t, displacementNm: 1 })))).toThrow(RangeError);
  });
});

describe('peak-to-peak method [practice]', () => {
  it('when 1000 nm p-p at 10 V p-p is read with 10 nm resolution, then 100 ± 100·(10/√6)/1000 nm/V, bounds 99–101 [calc]', () => {
    const r = peakToPeakGain({ displacementPpNm: 1000, voltsPpV: 10, displacementResolutionNm: 10 });
    expect(r.gainNmPerV).toBe(100);
    expect(r.gainStdUncNmPerV).toBeCloseTo((100 * (10 / Math.sqrt(6))) / 1000, 14);
    expect(r.gainBoundsNmPerV[0]).toBeCloseTo(99, 12);
    expect(r.gainBoundsNmPerV[1]).toBeCloseTo(101, 12);
  });

  it('when the voltage is read with 0.1 V resolution too, then relative uncertainties add in quadrature [calc]', () => {
    const r = peakToPeakGain({ displacementPpNm: 1000, voltsPpV: 10, displacementResolutionNm: 10, voltsResolutionV: 0.1 });
    const rel = Math.hypot(10 / Math.sqrt(6) / 1000, 0.1 / Math.sqrt(6) / 10);
    expect(r.gainRelStdUnc).toBeCloseTo(rel, 15);
    expect(r.gainBoundsNmPerV[0]).toBeCloseTo(990 / 10.1, 12);
    expect(r.gainBoundsNmPerV[1]).toBeCloseTo(1010 / 9.9, 12);
  });

  it('when a swing is not positive, then it throws', () => {
    expect(() => peakToPeakGain({ displacementPpNm: 0, voltsPpV: 10, displacementResolutionNm: 1 })).toThrow(RangeError);
  });
});
