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

