// How the expected-gain page presents each actuator kind: its label, the material constant its
// formula uses and the geometry it asks for; the formula with its source comes from shared/.
import { EXPECTED_GAIN_BASIS } from '@shared/workbench/expected-gain.ts';

/** Geometry fields an actuator kind may ask for (names as in the shared expected-gain schema). */
export type GeometryField = 'lengthMm' | 'thicknessMm' | 'outerDiameterMm' | 'wallMm' | 'layers' | 'plates';

/** The piezo constant a formula uses. */
export type Constant = 'd31PmPerV' | 'd33PmPerV' | 'd15PmPerV';

interface Kind {
  value:
    | 'plate-thickness'
    | 'plate-length'
    | 'stack'
    | 'shear-plate'
    | 'bimorph-series'
    | 'bimorph-parallel'
    | 'tube-quadrant'
    | 'tube-opposite-pair'
    | 'tube-axial';
  label: string;
  constant: Constant;
  fields: readonly { name: GeometryField; label: string; unit?: string; optional?: boolean }[];
}

const bar = [
  { name: 'lengthMm', label: 'Free length L', unit: 'mm' },
  { name: 'thicknessMm', label: 'Total thickness h', unit: 'mm' },
] as const;
const tube = [
  { name: 'lengthMm', label: 'Length L', unit: 'mm' },
  { name: 'outerDiameterMm', label: 'Outer diameter', unit: 'mm' },
  { name: 'wallMm', label: 'Wall thickness h', unit: 'mm' },
] as const;

/** Actuator kinds in the order the picker lists them. */
export const actuatorKinds: readonly Kind[] = [
  { value: 'bimorph-series', label: 'Bimorph bender, series (V across the whole bar)', constant: 'd31PmPerV', fields: bar },
  { value: 'bimorph-parallel', label: 'Bimorph bender, parallel (V across each half)', constant: 'd31PmPerV', fields: bar },
  { value: 'tube-quadrant', label: 'Quartered tube, one quadrant driven', constant: 'd31PmPerV', fields: tube },
  { value: 'tube-opposite-pair', label: 'Quartered tube, ±V on opposite quadrants', constant: 'd31PmPerV', fields: tube },
  { value: 'tube-axial', label: 'Tube, axial (all quadrants together)', constant: 'd31PmPerV', fields: tube },
  { value: 'stack', label: 'Multilayer stack', constant: 'd33PmPerV', fields: [{ name: 'layers', label: 'Layers n' }] },
  {
    value: 'shear-plate',
    label: 'Shear plate',
    constant: 'd15PmPerV',
    fields: [{ name: 'plates', label: 'Plates stacked', optional: true }],
  },
  { value: 'plate-thickness', label: 'Plate, thickness mode', constant: 'd33PmPerV', fields: [] },
  {
    value: 'plate-length',
    label: 'Plate, length mode',
    constant: 'd31PmPerV',
    fields: [
      { name: 'lengthMm', label: 'Length L', unit: 'mm' },
      { name: 'thicknessMm', label: 'Thickness t', unit: 'mm' },
    ],
  },
];

/** The presentation of one actuator kind, with its formula and source from shared/workbench/expected-gain.ts. */
export const kindOf = (value: string) => {
  const kind = actuatorKinds.find((k) => k.value === value) ?? actuatorKinds[0]!;
  return { ...kind, basis: EXPECTED_GAIN_BASIS[kind.value] };
};

/** Short names of the constants, for labels and messages. */
export const constantLabels: Record<Constant, string> = { d31PmPerV: 'd31', d33PmPerV: 'd33', d15PmPerV: 'd15' };
