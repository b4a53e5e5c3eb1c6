// Displacement and voltage units used across the workbench, the API and the forms.
// 1 in = 25.4 mm exactly (international yard = 0.9144 m from 1 July 1959)
// [S: NBS Circular 572 addendum, 1960] → 1 µin = 25.4 nm, 1 mil = 25.4 µm [calc]; 1 Å = 0.1 nm.

/** Displacement units a calibration run may be recorded in (zod enums and pickers read this). */
export const displacementUnits = ['nm', 'um', 'angstrom', 'uin', 'mil'] as const;

/** One of the supported displacement units. */
export type DisplacementUnit = (typeof displacementUnits)[number];

/** Voltage units a calibration run may be recorded in. */
export const voltageUnits = ['V', 'mV'] as const;

/** One of the supported voltage units. */
export type VoltageUnit = (typeof voltageUnits)[number];

/** Human labels so every page spells a unit the same way. */
export const displacementUnitLabels: Readonly<Record<DisplacementUnit, string>> = {
  nm: 'nm',
  um: 'µm',
  angstrom: 'Å',
  uin: 'µin',
  mil: 'mil',
};

/** Human labels for voltage units. */
export const voltageUnitLabels: Readonly<Record<VoltageUnit, string>> = { V: 'V', mV: 'mV' };

// Exact ratios (numerator/denominator) so that 0.1 and 25.4 are applied as /10 and ·254/10,
// each step a correctly rounded operation on integers.
const nmRatio: Readonly<Record<DisplacementUnit, readonly [number, number]>> = {
  nm: [1, 1],
  um: [1000, 1],
  angstrom: [1, 10],
  uin: [254, 10],
  mil: [254000, 10],
};

/** Nanometres per unit (1, 1000, 0.1, 25.4, 25400), for callers that need a plain factor. */
export const nmPerDisplacementUnit: Readonly<Record<DisplacementUnit, number>> = {
  nm: 1,
  um: 1000,
  angstrom: 0.1,
  uin: 25.4,
  mil: 25400,
};

/** Converts a displacement to nanometres, the unit every computation works in. */
export function toNm(value: number, unit: DisplacementUnit): number {
  const [num, den] = nmRatio[unit];
  return den === 1 ? value * num : (value * num) / den;
}

/** Converts nanometres back to the unit the user recorded in, for display. */
export function fromNm(valueNm: number, unit: DisplacementUnit): number {
  const [num, den] = nmRatio[unit];
  return den === 1 ? valueNm / num : (valueNm * den) / num;
}

/** Converts a voltage reading to volts, the unit every computation works in. */
export function toVolts(value: number, unit: VoltageUnit): number {
  return unit === 'mV' ? value / 1000 : value;
}

/** Converts volts back to the unit the user recorded in, for display. */
export function fromVolts(valueV: number, unit: VoltageUnit): number {
  return unit === 'mV' ? valueV * 1000 : valueV;
}

/** Converts between any two displacement units (the workbench's unit converter). */
export function convertDisplacement(value: number, from: DisplacementUnit, to: DisplacementUnit): number {
  return from === to ? value : fromNm(toNm(value, from), to);
}

/** Gain units a gain may be written in (nm/V, µm/V, Å/V, µin/V). */
export const gainUnits = ['nm/V', 'um/V', 'angstrom/V', 'uin/V'] as const;

/** One of the supported gain units. */
export type GainUnit = (typeof gainUnits)[number];

/** Human labels for gain units. */
export const gainUnitLabels: Readonly<Record<GainUnit, string>> = { 'nm/V': 'nm/V', 'um/V': 'µm/V', 'angstrom/V': 'Å/V', 'uin/V': 'µin/V' };

const gainDisplacement: Readonly<Record<GainUnit, DisplacementUnit>> = {
  'nm/V': 'nm',
  'um/V': 'um',
  'angstrom/V': 'angstrom',
  'uin/V': 'uin',
};

/** Every unit the converter knows, of any kind. */
export const convertibleUnits = [...displacementUnits, ...voltageUnits, ...gainUnits] as const;

/** A unit of any kind. */
export type ConvertibleUnit = (typeof convertibleUnits)[number];

/** What a unit measures; only units of one kind convert into each other. */
export type QuantityKind = 'displacement' | 'voltage' | 'gain';

/** The kind of a unit. */
export function kindOfUnit(unit: ConvertibleUnit): QuantityKind {
  if ((displacementUnits as readonly string[]).includes(unit)) return 'displacement';
  if ((voltageUnits as readonly string[]).includes(unit)) return 'voltage';
  return 'gain';
}

/** The units of the same kind as `unit`, with their labels, in picker order. */
export function unitsOfKind(unit: ConvertibleUnit): { key: ConvertibleUnit; label: string }[] {
  switch (kindOfUnit(unit)) {
    case 'displacement':
      return displacementUnits.map((key) => ({ key, label: displacementUnitLabels[key] }));
    case 'voltage':
      return voltageUnits.map((key) => ({ key, label: voltageUnitLabels[key] }));
    default:
      return gainUnits.map((key) => ({ key, label: gainUnitLabels[key] }));
  }
}

/** Converts a gain between gain units (the volt is common to all, so the length part converts). */
export function convertGain(value: number, from: GainUnit, to: GainUnit): number {
  return convertDisplacement(value, gainDisplacement[from], gainDisplacement[to]);
}

/** Converts between two units of the same kind; throws a RangeError across kinds. */
export function convertQuantity(value: number, from: ConvertibleUnit, to: ConvertibleUnit): number {
  const kind = kindOfUnit(from);
  if (kind !== kindOfUnit(to)) throw new RangeError(`cannot convert ${kind} into ${kindOfUnit(to)}`);
  if (from === to) return value;
  if (kind === 'displacement') return convertDisplacement(value, from as DisplacementUnit, to as DisplacementUnit);
  if (kind === 'voltage') return fromVolts(toVolts(value, from as VoltageUnit), to as VoltageUnit);
  return convertGain(value, from as GainUnit, to as GainUnit);
}

/** Spellings people type for a unit, mapped to its key ("µm" → "um", "Å/V" → "angstrom/V"). */
const unitAliases: Readonly<Record<string, ConvertibleUnit>> = {
  µm: 'um',
  μm: 'um',
  Å: 'angstrom',
  µin: 'uin',
  μin: 'uin',
  'µm/V': 'um/V',
  'μm/V': 'um/V',
  'Å/V': 'angstrom/V',
  'µin/V': 'uin/V',
  'μin/V': 'uin/V',
};

/** A unit as typed, turned into its key when it is a known spelling; anything else passes unchanged (for zod to judge). */
export function unitKey(value: unknown): unknown {
  return typeof value === 'string' && value in unitAliases ? unitAliases[value] : value;
}
