// Which expected-gain formula fits a registry part used in a given way, when its geometry and
// material are known. Pure; the formulas and their sources are in expected-gain.ts.
import { expectedGain, type ExpectedGain, type ExpectedGainSpec } from './expected-gain.ts';
import { isMaterialKey } from './materials.ts';

/** The part fields the choice needs (mm; material as a family name such as "PZT-5A"). */
export interface PartForExpectedGain {
  category: string;
  material: string | null;
  lengthMm: number | null;
  thicknessMm: number | null;
  outerDiameterMm: number | null;
  wallMm: number | null;
  layers: number | null;
}

const has = (v: number | null): v is number => v !== null && Number.isFinite(v) && v > 0;

/**
 * The formula for this part and drive, or null when the category has none (buzzer discs, voice
 * coils: unimorph or magnetic, not covered) or geometry/material are missing. A bender driven as
 * one element is taken as series-connected (the usual two-wire bar); a tube on the Z axis (all
 * quadrants together) uses the axial formula; a quartered tube driven with ±V on opposite
 * quadrants the opposite-pair formula; a tube otherwise one quadrant.
 */
export function expectedGainSpecForPart(part: PartForExpectedGain, drive: string, axis?: string): ExpectedGainSpec | null {
  if (!part.material || !isMaterialKey(part.material)) return null;
  const material = part.material;
  switch (part.category) {
    case 'bimorph':
      return has(part.lengthMm) && has(part.thicknessMm)
        ? { actuator: 'bimorph-series', material, lengthMm: part.lengthMm, thicknessMm: part.thicknessMm }
        : null;
    case 'stack':
      return has(part.layers) ? { actuator: 'stack', material, layers: part.layers } : null;
    case 'shear-plate':
      return { actuator: 'shear-plate', material };
    case 'tube':
      if (!has(part.lengthMm) || !has(part.outerDiameterMm) || !has(part.wallMm)) return null;
      return {
        actuator: axis === 'Z' ? 'tube-axial' : drive === 'quartered-tube' ? 'tube-opposite-pair' : 'tube-quadrant',
        material,
        lengthMm: part.lengthMm,
        outerDiameterMm: part.outerDiameterMm,
        wallMm: part.wallMm,
      };
    default:
      return null;
  }
}

/** Expected gain with its band and the formula's name, or null where no formula applies. */
export function expectedGainForPart(part: PartForExpectedGain, drive: string, axis?: string): (ExpectedGain & { basis: string }) | null {
  const spec = expectedGainSpecForPart(part, drive, axis);
  if (!spec) return null;
  try {
    return { ...expectedGain(spec), basis: `${spec.actuator}, ${part.material}` };
  } catch {
    return null;
  }
}
