// Safety thresholds and caution texts shared by every workbench page (FIELD.md "Safety").

/** Above this |V| a page shows the high-voltage cautions (FIELD.md: "exceed ~50 V"). */
export const HIGH_VOLTAGE_THRESHOLD_V = 50;

// Stored-charge flag [practice; our choice, no published source]: set low on purpose, so that a
// µF-class multilayer stack is flagged even at a few tens of volts while a buzzer disc or bender
// (nF) at bench voltages is not. Either limit trips the flag.
/** Stored energy ½CV² at or above which the stored-charge cautions show [practice]. */
export const STORED_ENERGY_THRESHOLD_J = 1e-3;

/** Stored charge CV at or above which the stored-charge cautions show [practice]. */
export const STORED_CHARGE_THRESHOLD_C = 50e-6;

/** Resistance to discharge a piezo element through (about 10 kΩ, never a short). */
export const DISCHARGE_RESISTOR_OHM = 10e3;

/** Identifiers of the cautions, so pages can pick and order them. */
export const cautionIds = [
  'amplifier',
  'discharge',
  'supply-off',
  'reverse-voltage',
  'lead-dust',
  'local-codes',
] as const;

/** One caution identifier. */
export type CautionId = (typeof cautionIds)[number];

/** A caution to show, with the FIELD.md tag of where it comes from. */
export interface Caution {
  id: CautionId;
  text: string;
  source: string;
}

/** Caution texts in our own words, each tagged as FIELD.md tags it. */
export const cautions: Readonly<Record<CautionId, Caution>> = {
  amplifier: {
    id: 'amplifier',
    text:
      'The amplifier behind a piezo is usually the dangerous part: its supply runs at 100–1000 V. ' +
      'Enclose it, limit its output current, fit bleeder resistors and use HV-rated connectors.',
    source: '[practice]',
  },
  discharge: {
    id: 'discharge',
    text:
      'Piezo elements hold charge for a long time and make charge when heated or loaded. ' +
      'Discharge them through a resistor of about 10 kΩ, never with a short.',
    source: '[S: actuator vendor user manuals]',
  },
  'supply-off': {
    id: 'supply-off',
    text: 'Connect and disconnect piezo elements with the supply off.',
    source: '[S: actuator vendor user manuals]',
  },
  'reverse-voltage': {
    id: 'reverse-voltage',
    text:
      "Don't exceed the element's reverse-voltage limit (it depoles), keep reverse fields well below " +
      'the coercive field, and don’t heat soft-PZT parts by soldering.',
    source: '[practice]',
  },
  'lead-dust': {
    id: 'lead-dust',
    text: 'Cutting or grinding PZT makes lead-bearing dust: wet-cut, and wash your hands.',
    source: '[practice]',
  },
  'local-codes': {
    id: 'local-codes',
    text: 'These notes do not replace local electrical codes or qualified practice; follow those first.',
    source: '[practice]',
  },
};

/** What a page's inputs trip: high voltage, stored charge, or both. */
export interface SafetyFlags {
  highVoltage: boolean;
  storedCharge: boolean;
}

const highVoltageCautions: readonly CautionId[] = ['amplifier', 'supply-off', 'discharge', 'reverse-voltage'];
const storedChargeCautions: readonly CautionId[] = ['discharge', 'supply-off'];

/** The cautions to show for a set of flags, in display order (empty when nothing is tripped). */
export function cautionsFor(flags: SafetyFlags): Caution[] {
  const ids = new Set<CautionId>([
    ...(flags.highVoltage ? highVoltageCautions : []),
    ...(flags.storedCharge ? storedChargeCautions : []),
  ]);
  if (ids.size > 0) ids.add('local-codes');
  return cautionIds.filter((id) => ids.has(id)).map((id) => cautions[id]);
}
