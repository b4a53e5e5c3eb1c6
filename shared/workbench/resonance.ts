// First bending resonance of a clamped-free (cantilever) beam, Euler–Bernoulli
// [S: Rao, Mechanical Vibrations; Timoshenko, Vibration Problems in Engineering]. SI units.

/** λ1 of a cantilever, first root of cos λ·cosh λ = −1 (FIELD.md quotes 1.8751) [calc]. */
export const CANTILEVER_LAMBDA1 = 1.875104068711961;

/** Effective end mass of a cantilever as a fraction of beam mass: 3/λ1⁴ ≈ 0.2427 [calc]. */
export const CANTILEVER_EFFECTIVE_MASS_FRACTION = 3 / CANTILEVER_LAMBDA1 ** 4;

/** Beam section and material for the general formula. */
export interface BeamSection {
  youngsModulusPa: number;
  secondMomentM4: number;
  densityKgPerM3: number;
  areaM2: number;
  lengthM: number;
}

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

/** First mode of any uniform section: f1 = (λ1²/2π)·√(E·I/(ρ·A·L⁴)). */
export function cantileverFirstModeHz(b: BeamSection): number {
  const e = positive(b.youngsModulusPa, 'E');
  const i = positive(b.secondMomentM4, 'I');
  const rho = positive(b.densityKgPerM3, 'density');
  const a = positive(b.areaM2, 'area');
  const l = positive(b.lengthM, 'length');
  return (CANTILEVER_LAMBDA1 ** 2 / (2 * Math.PI)) * Math.sqrt((e * i) / (rho * a * l ** 4));
}

/** A rectangular bar or lever (width only matters for the spring constant). */
export interface RectangularBeam {
  lengthM: number;
  thicknessM: number;
  widthM?: number;
  youngsModulusPa: number;
  densityKgPerM3: number;
}

/** A rectangular beam whose width is known (spring constant and mass need it). */
export type RectangularBeamWithWidth = RectangularBeam & { widthM: number };

/**
 * Rectangular shortcut: I/A = t²/12, so f1 = (λ1²/2π)·(t/L²)·√(E/(12ρ)) ≈ 0.1615·(t/L²)·√(E/ρ).
 * Checks [calc]: PZT-5A bar 12 × 0.6 mm → 1.89 kHz; silicon lever 125 × 30 × 4 µm → 352 kHz.
 */
export function rectangularCantileverHz(b: RectangularBeam): number {
  const t = positive(b.thicknessM, 'thickness');
  const l = positive(b.lengthM, 'length');
  const e = positive(b.youngsModulusPa, 'E');
  const rho = positive(b.densityKgPerM3, 'density');
  return (CANTILEVER_LAMBDA1 ** 2 / (2 * Math.PI)) * (t / (l * l)) * Math.sqrt(e / (12 * rho));
}

/** End-load spring constant of a rectangular cantilever: k = E·w·t³/(4L³) (= 3EI/L³). */
export function cantileverSpringConstantNPerM(b: RectangularBeamWithWidth): number {
  const t = positive(b.thicknessM, 'thickness');
  const l = positive(b.lengthM, 'length');
  return (positive(b.youngsModulusPa, 'E') * positive(b.widthM, 'width') * t ** 3) / (4 * l ** 3);
}

/**
 * First mode with a tip mass M on a beam of mass m: f ≈ f1·√(0.2427m/(0.2427m + M))
 * [calc: effective mass 3m/1.8751⁴ = 0.2427m, so that f1 = √(k/m_eff)/2π with k = 3EI/L³].
 */
export function tipMassCorrectedHz(firstModeHz: number, beamMassKg: number, tipMassKg: number): number {
  const mEff = CANTILEVER_EFFECTIVE_MASS_FRACTION * positive(beamMassKg, 'beam mass');
  if (!(tipMassKg >= 0)) throw new RangeError('tip mass must not be negative');
  return firstModeHz * Math.sqrt(mEff / (mEff + tipMassKg));
}

/** Mass of a rectangular beam, so the tip-mass correction can be fed from the same inputs. */
export function rectangularBeamMassKg(b: RectangularBeamWithWidth): number {
  const volumeM3 = positive(b.lengthM, 'length') * positive(b.widthM, 'width') * positive(b.thicknessM, 'thickness');
  return positive(b.densityKgPerM3, 'density') * volumeM3;
}
