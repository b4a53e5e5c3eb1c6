// A quartered piezo tube: the capacitance the amplifier drives, and its first bending and axial
// resonances as a tube clamped at one end. Geometry in mm (as the expected-gain tube), the rest SI.
import { tubeCapacitanceF } from './drive-current.ts';
import { tubeWall, type TubeGeometry } from './expected-gain.ts';
import { cantileverFirstModeHz } from './resonance.ts';

const M_PER_MM = 1e-3;

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

/** The tube's diameters in metres, after checking that the wall leaves a bore. */
export function tubeDiametersM(g: TubeGeometry): { lengthM: number; outerDiameterM: number; innerDiameterM: number } {
  const { od, wall } = tubeWall(g);
  return { lengthM: positive(g.lengthMm, 'length') * M_PER_MM, outerDiameterM: od * M_PER_MM, innerDiameterM: (od - 2 * wall) * M_PER_MM };
}

/**
 * Whole-tube capacitance from the coaxial formula C = 2π·ε0·εr·L/ln(OD/ID) [memory, FIELD.md], and
 * one quadrant as a quarter of it: each quadrant electrode covers a quarter of the circumference,
 * the gaps between them neglected [calc].
 */
export function tubeCapacitances(g: TubeGeometry & { relPermittivity: number }): {
  tubeCapacitanceF: number;
  quadrantCapacitanceF: number;
} {
  const whole = tubeCapacitanceF({ ...tubeDiametersM(g), relPermittivity: g.relPermittivity });
  return { tubeCapacitanceF: whole, quadrantCapacitanceF: whole / 4 };
}

/** Annulus section: A = π(OD² − ID²)/4, I = π(OD⁴ − ID⁴)/64 about a diameter [calc]. */
export function annulusSection(outerDiameterM: number, innerDiameterM: number): { areaM2: number; secondMomentM4: number } {
  const od = positive(outerDiameterM, 'outer diameter');
  const id = innerDiameterM;
  if (!(id >= 0) || id >= od) throw new RangeError('inner diameter must be at least 0 and smaller than the outer diameter');
  return { areaM2: (Math.PI * (od ** 2 - id ** 2)) / 4, secondMomentM4: (Math.PI * (od ** 4 - id ** 4)) / 64 };
}

/** Tube material for the resonances. */
export interface TubeMaterial {
  youngsModulusPa: number;
  densityKgPerM3: number;
}

/**
 * First bending mode of the tube clamped at one end: the Euler–Bernoulli cantilever
 * f1 = (λ1²/2π)·√(E·I/(ρ·A·L⁴)) with the annulus section [S: Rao, Mechanical Vibrations; Timoshenko].
 */
export function tubeBendingModeHz(g: TubeGeometry & TubeMaterial): number {
  const d = tubeDiametersM(g);
  return cantileverFirstModeHz({
    ...annulusSection(d.outerDiameterM, d.innerDiameterM),
    youngsModulusPa: g.youngsModulusPa,
    densityKgPerM3: g.densityKgPerM3,
    lengthM: d.lengthM,
  });
}

/**
 * First axial (longitudinal) mode of a rod clamped at one end and free at the other:
 * f = (1/4L)·√(E/ρ), a quarter wavelength along the rod [S: Rao, Mechanical Vibrations,
 * longitudinal vibration of a bar — memory for the equation number].
 */
export function axialModeHz(lengthM: number, m: TubeMaterial): number {
  return Math.sqrt(positive(m.youngsModulusPa, 'E') / positive(m.densityKgPerM3, 'density')) / (4 * positive(lengthM, 'length'));
}
