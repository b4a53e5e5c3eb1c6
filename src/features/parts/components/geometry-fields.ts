import type { PartCategory } from '@shared/schemas/part-vocabulary.ts';

/** Geometry inputs of a proposal. */
export type GeometryKey = 'lengthMm' | 'widthMm' | 'thicknessMm' | 'outerDiameterMm' | 'wallMm' | 'layers';

/** One geometry input: which field, its label, unit and an optional hint. */
export interface GeometryField {
  key: GeometryKey;
  label: string;
  unit: 'mm' | 'layers';
  hint?: string;
}

const length = (label = 'Length', hint?: string): GeometryField => ({ key: 'lengthMm', label, unit: 'mm', hint });
const width: GeometryField = { key: 'widthMm', label: 'Width', unit: 'mm' };
const thickness = (label = 'Thickness', hint?: string): GeometryField => ({ key: 'thicknessMm', label, unit: 'mm', hint });
const diameter: GeometryField = { key: 'outerDiameterMm', label: 'Outer diameter', unit: 'mm' };
const wall: GeometryField = { key: 'wallMm', label: 'Wall thickness', unit: 'mm' };
const layers: GeometryField = {
  key: 'layers',
  label: 'Number of layers',
  unit: 'layers',
  hint: 'An estimate is fine; say how you counted in the notes.',
};

/** The geometry that matters for each category (what the expected-gain formulas use, and what helps identify the part). */
export const geometryFor: Record<PartCategory, GeometryField[]> = {
  bimorph: [length('Free length', 'From the clamp to the tip.'), width, thickness('Total thickness', 'Both ceramic layers together.')],
  'buzzer-disc': [diameter, thickness('Total thickness', 'Ceramic and brass together.')],
  stack: [length('Height', 'Along the direction it extends.'), width, thickness('Depth'), layers],
  tube: [length(), diameter, wall],
  'shear-plate': [length(), width, thickness()],
  'voice-coil': [diameter, length()],
  other: [length(), width, thickness(), diameter, wall, layers],
};

/** Every geometry key, for clearing the ones a category does not use. */
export const GEOMETRY_KEYS: readonly GeometryKey[] = ['lengthMm', 'widthMm', 'thicknessMm', 'outerDiameterMm', 'wallMm', 'layers'];
