// Expected free (unloaded) displacement per volt from geometry and material (FIELD.md
// "Displacement per volt"). Real parts are lower; always measure. Geometry is in mm and only
// enters as ratios; d constants are pm/V; results are nm/V with a ±20 % material band.
import { MATERIAL_BAND_FRACTION, isMaterialKey, materials, type MaterialKey } from './materials.ts';

/** A built-in material, or the user's own constants (only the one a formula needs is required). */
export type MaterialInput = MaterialKey | { d31PmPerV?: number; d33PmPerV?: number; d15PmPerV?: number };

/** An expected gain with the band that material variation alone allows. */
export interface ExpectedGain {
  gainNmPerV: number;
  lowNmPerV: number;
  highNmPerV: number;
}

type Coefficient = 'd31PmPerV' | 'd33PmPerV' | 'd15PmPerV';

function coefficientNmPerV(material: MaterialInput, name: Coefficient): number {
  const value = isMaterialKey(material) ? materials[material][name] : material[name];
  if (value === undefined || !Number.isFinite(value) || value === 0) {
    throw new RangeError(`material constant ${name} is required`);
  }
  return Math.abs(value) / 1000;
}

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

function withBand(gainNmPerV: number): ExpectedGain {
  return {
    gainNmPerV,
    lowNmPerV: gainNmPerV * (1 - MATERIAL_BAND_FRACTION),
    highNmPerV: gainNmPerV * (1 + MATERIAL_BAND_FRACTION),
  };
}

/** Plate, thickness mode: Δt = d33·V (independent of thickness) [FIELD.md table]. */
export function plateThicknessGain(material: MaterialInput): ExpectedGain {
  return withBand(coefficientNmPerV(material, 'd33PmPerV'));
}

/** Plate, length mode: ΔL = d31·V·L/t [FIELD.md table]. */
export function plateLengthGain(material: MaterialInput, g: { lengthMm: number; thicknessMm: number }): ExpectedGain {
  const ratio = positive(g.lengthMm, 'length') / positive(g.thicknessMm, 'thickness');
  return withBand(coefficientNmPerV(material, 'd31PmPerV') * ratio);
}

/** Multilayer stack of n layers: ΔL = n·d33·V [S: Murata piezo actuator basics]. */
export function stackGain(material: MaterialInput, g: { layers: number }): ExpectedGain {
  if (!Number.isInteger(g.layers) || g.layers < 1) throw new RangeError('layers must be a whole number ≥ 1');
  return withBand(g.layers * coefficientNmPerV(material, 'd33PmPerV'));
}

/** Shear plate: Δx = d15·V per plate; plates stacked mechanically in series add [FIELD.md table]. */
export function shearPlateGain(material: MaterialInput, g: { plates?: number } = {}): ExpectedGain {
  const plates = g.plates ?? 1;
  if (!Number.isInteger(plates) || plates < 1) throw new RangeError('plates must be a whole number ≥ 1');
  return withBand(plates * coefficientNmPerV(material, 'd15PmPerV'));
}

/**
 * Bimorph bender, series (V across total thickness h): δ = (3/2)·d31·V·L²/h²
 * [S: Smits, Dalke & Cooney, Sens. Actuators A 28 (1991) 41; same as Tzou 1989 eq. 20].
 */
export function bimorphSeriesGain(material: MaterialInput, g: { lengthMm: number; thicknessMm: number }): ExpectedGain {
  const ratio = positive(g.lengthMm, 'length') / positive(g.thicknessMm, 'thickness');
  return withBand(1.5 * coefficientNmPerV(material, 'd31PmPerV') * ratio * ratio);
}

/** Bimorph bender, parallel (V across each half): δ = 3·d31·V·L²/h² [S: Smits, Dalke & Cooney 1991]. */
export function bimorphParallelGain(material: MaterialInput, g: { lengthMm: number; thicknessMm: number }): ExpectedGain {
  const ratio = positive(g.lengthMm, 'length') / positive(g.thicknessMm, 'thickness');
  return withBand(3 * coefficientNmPerV(material, 'd31PmPerV') * ratio * ratio);
}

/** Tube geometry: length, outer diameter and wall thickness, all in mm. */
export interface TubeGeometry {
  lengthMm: number;
  outerDiameterMm: number;
  wallMm: number;
}

/** Checks a tube's wall against its diameter (a wall of OD/2 or more leaves no bore). */
export function tubeWall(g: { outerDiameterMm: number; wallMm: number }): { od: number; wall: number } {
  const od = positive(g.outerDiameterMm, 'outer diameter');
  const wall = positive(g.wallMm, 'wall');
  if (wall >= od / 2) throw new RangeError('wall must be less than half the outer diameter');
  return { od, wall };
}

/**
 * One quadrant at V: Δx = √2·d31·V·L²/(π·D·h), D = OD − h. The strain d31·V/h of one 90° quadrant
 * acts about the tube's neutral axis: its moment over the second moment π·R³·h gives the curvature
 * ε₀·√2/(π·R) with R = D/2, and a free end deflects curvature·L²/2 [S: C. J. Chen, Appl. Phys. Lett.
 * 60, 132 (1992); derivation calc].
 */
function tubeLateral(material: MaterialInput, g: TubeGeometry): number {
  const length = positive(g.lengthMm, 'length');
  const { od, wall } = tubeWall(g);
  const meanDiameter = od - wall;
  return (Math.SQRT2 * coefficientNmPerV(material, 'd31PmPerV') * length * length) / (Math.PI * meanDiameter * wall);
}

/**
 * Quartered tube, one quadrant at V: Δx = √2·d31·V·L²/(π·D·h), D = mean diameter = OD − wall
 * [S: C. J. Chen, Appl. Phys. Lett. 60, 132 (1992)].
 */
export function tubeQuadrantGain(material: MaterialInput, g: TubeGeometry): ExpectedGain {
  return withBand(tubeLateral(material, g));
}

/** Quartered tube, ±V on opposite quadrants: 2√2·d31·V·L²/(π·D·h), twice one quadrant [S: Chen 1992]. */
export function tubeOppositePairGain(material: MaterialInput, g: TubeGeometry): ExpectedGain {
  return withBand(2 * tubeLateral(material, g));
}

/** Tube, axial (all quadrants at V): ΔL = d31·V·L/h [FIELD.md table]; the wall must leave a bore. */
export function tubeAxialGain(material: MaterialInput, g: TubeGeometry): ExpectedGain {
  const { wall } = tubeWall(g);
  const ratio = positive(g.lengthMm, 'length') / wall;
  return withBand(coefficientNmPerV(material, 'd31PmPerV') * ratio);
}

/** Gain against an external spring: ΔL ≈ ΔL0·k_a/(k_a + k_s) [memory]. */
export function loadedGainNmPerV(freeGainNmPerV: number, actuatorStiffnessNPerM: number, springStiffnessNPerM: number): number {
  const ka = positive(actuatorStiffnessNPerM, 'actuator stiffness');
  if (!(springStiffnessNPerM >= 0)) throw new RangeError('spring stiffness must not be negative');
  return (freeGainNmPerV * ka) / (ka + springStiffnessNPerM);
}

/** Measured ÷ expected as a sanity check, and whether the measurement falls inside the band. */
export function measuredToExpectedRatio(measuredNmPerV: number, expected: ExpectedGain): { ratio: number; withinBand: boolean } {
  const measured = Math.abs(measuredNmPerV);
  return {
    ratio: measured / expected.gainNmPerV,
    withinBand: measured >= expected.lowNmPerV && measured <= expected.highNmPerV,
  };
}

/** Actuator kinds the expected-gain page offers, with the geometry each needs. */
export type ExpectedGainSpec =
  | { actuator: 'plate-thickness'; material: MaterialInput }
  | { actuator: 'plate-length'; material: MaterialInput; lengthMm: number; thicknessMm: number }
  | { actuator: 'stack'; material: MaterialInput; layers: number }
  | { actuator: 'shear-plate'; material: MaterialInput; plates?: number }
  | { actuator: 'bimorph-series' | 'bimorph-parallel'; material: MaterialInput; lengthMm: number; thicknessMm: number }
  | ({ actuator: 'tube-quadrant' | 'tube-opposite-pair' | 'tube-axial'; material: MaterialInput } & TubeGeometry);

/** One entry point for the page and the API: dispatches on the actuator kind. */
export function expectedGain(spec: ExpectedGainSpec): ExpectedGain {
  switch (spec.actuator) {
    case 'plate-thickness':
      return plateThicknessGain(spec.material);
    case 'plate-length':
      return plateLengthGain(spec.material, spec);
    case 'stack':
      return stackGain(spec.material, spec);
    case 'shear-plate':
      return shearPlateGain(spec.material, spec);
    case 'bimorph-series':
      return bimorphSeriesGain(spec.material, spec);
    case 'bimorph-parallel':
      return bimorphParallelGain(spec.material, spec);
    case 'tube-quadrant':
      return tubeQuadrantGain(spec.material, spec);
    case 'tube-opposite-pair':
      return tubeOppositePairGain(spec.material, spec);
    case 'tube-axial':
      return tubeAxialGain(spec.material, spec);
  }
}

/**
 * Each kind's formula with its source, as the pages print it (the same sources as the functions'
 * comments above; the part page and the workbench both show these).
 */
export const EXPECTED_GAIN_BASIS: Record<ExpectedGainSpec['actuator'], string> = {
  'bimorph-series': 'δ = (3/2)·d31·V·L²/h² — Smits, Dalke & Cooney, Sens. Actuators A 28 (1991) 41, series bimorph.',
  'bimorph-parallel': 'δ = 3·d31·V·L²/h² — Smits, Dalke & Cooney 1991, parallel bimorph.',
  'tube-quadrant': 'Δx = √2·d31·V·L²/(π·D·h), D = OD − h, one quadrant at V — C. J. Chen, Appl. Phys. Lett. 60, 132 (1992).',
  'tube-opposite-pair': 'Δx = 2√2·d31·V·L²/(π·D·h), ±V on opposite quadrants — C. J. Chen, Appl. Phys. Lett. 60, 132 (1992).',
  'tube-axial': 'ΔL = d31·V·L/h, length-mode strain of the wall.',
  stack: 'ΔL = n·d33·V — Murata, piezo actuator basics.',
  'shear-plate': 'Δx = d15·V per plate; stacked plates add.',
  'plate-thickness': 'Δt = d33·V, whatever the thickness.',
  'plate-length': 'ΔL = d31·V·L/t.',
};

/** Each formula's source, short, as a page cites it beside a figure. */
export const EXPECTED_GAIN_SOURCE: Record<ExpectedGainSpec['actuator'], string> = {
  'bimorph-series': 'Source: Smits, Dalke & Cooney 1991',
  'bimorph-parallel': 'Source: Smits, Dalke & Cooney 1991',
  'tube-quadrant': 'Source: Chen, APL 1992',
  'tube-opposite-pair': 'Source: Chen, APL 1992',
  'tube-axial': "calculated from the wall's length-mode strain",
  stack: 'Source: Murata, piezo actuator basics',
  'shear-plate': 'calculated from d15',
  'plate-thickness': 'calculated from d33',
  'plate-length': 'calculated from d31',
};
