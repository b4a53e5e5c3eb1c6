// How far an expected gain can move when the geometry is only known to a tolerance: first-order
// propagation of uncorrelated inputs, u_r(g)² = Σ (∂ln g/∂x_i · u(x_i))² [S: GUM, JCGM 100:2008,
// 5.1.2], each ± tolerance a read as a rectangular distribution, u = a/√3 [S: GUM 4.3.7].
import type { ExpectedGainSpec } from './expected-gain.ts';

/** ± half-widths (mm) of the geometry fields a formula uses; missing means exact. */
export interface GeometryTolerances {
  lengthMm?: number;
  thicknessMm?: number;
  outerDiameterMm?: number;
  wallMm?: number;
}

/** Relative standard uncertainty of the gain from geometry alone, and each field's share of it. */
export interface GainTolerance {
  relStdUnc: number;
  contributions: { field: keyof GeometryTolerances; relStdUnc: number }[];
}

type Sensitivity = [keyof GeometryTolerances, number];

/** ∂ln g/∂x (per mm) for the fields the formula uses (from the formulas in expected-gain.ts) [calc]. */
function sensitivities(spec: ExpectedGainSpec): Sensitivity[] {
  switch (spec.actuator) {
    case 'plate-length':
      return [
        ['lengthMm', 1 / spec.lengthMm],
        ['thicknessMm', -1 / spec.thicknessMm],
      ];
    case 'bimorph-series':
    case 'bimorph-parallel':
      // g ∝ L²/h²
      return [
        ['lengthMm', 2 / spec.lengthMm],
        ['thicknessMm', -2 / spec.thicknessMm],
      ];
    case 'tube-quadrant':
    case 'tube-opposite-pair': {
      // g ∝ L²/((OD − h)·h)
      const d = spec.outerDiameterMm - spec.wallMm;
      return [
        ['lengthMm', 2 / spec.lengthMm],
        ['outerDiameterMm', -1 / d],
        ['wallMm', 1 / d - 1 / spec.wallMm],
      ];
    }
    case 'tube-axial':
      // g ∝ L/h
      return [
        ['lengthMm', 1 / spec.lengthMm],
        ['wallMm', -1 / spec.wallMm],
      ];
    default:
      return [];
  }
}

/** First-order relative uncertainty of the expected gain from ± geometry tolerances (rectangular). */
export function expectedGainTolerance(spec: ExpectedGainSpec, tolerances: GeometryTolerances): GainTolerance {
  const contributions: GainTolerance['contributions'] = [];
  let sum = 0;
  for (const [field, c] of sensitivities(spec)) {
    const a = tolerances[field];
    if (a === undefined) continue;
    if (!(a >= 0) || !Number.isFinite(a)) throw new RangeError(`the ${field.replace('Mm', '')} tolerance must not be negative`);
    const u = Math.abs(c) * (a / Math.sqrt(3));
    contributions.push({ field, relStdUnc: u });
    sum += u * u;
  }
  return { relStdUnc: Math.sqrt(sum), contributions };
}
