// Safety levels and caution texts: one rule for every page, form and API that deals with piezo
// drive voltages or the charge a piezo keeps (FIELD.md "Safety").
//
// Levels above which a voltage is treated as hazardous live in normal conditions: 30 V rms,
// 42.4 V peak or 60 V DC, and a stored charge above 45 µC (for voltages up to 15 kV)
// [S: IEC 61010-1, 2nd ed. (2001), clause 6.3.1 — memory for the clause; the 3rd ed. (2010) reads
// 33 V rms / 46.7 V peak / 70 V DC, so the 2nd edition's levels are the conservative default].

/** The IEC 61010-1 (2nd ed.) levels, named with their source so pages can print them. */
export const HAZARDOUS_LIVE_LEVELS = {
  rmsV: 30,
  peakV: 42.4,
  dcV: 60,
  chargeC: 45e-6,
  source: 'IEC 61010-1 (2nd ed., 2001), clause 6.3.1',
} as const;

/**
 * What a page knows about the voltages involved: a steady (DC) level such as calibration steps or a
 * voltage limit, the peak of a changing waveform, its rms, and the charge left on the element.
 * A limit that bounds an arbitrary drive waveform is passed as `peakV`: any waveform inside it peaks there.
 */
export interface VoltageExposure {
  dcV?: number;
  peakV?: number;
  rmsV?: number;
  chargeC?: number;
}

/** Identifiers of the cautions, so pages can pick and order them. */
export const cautionIds = ['levels', 'amplifier', 'discharge', 'supply-off', 'reverse-voltage', 'lead-dust', 'local-codes'] as const;

/** One caution identifier. */
export type CautionId = (typeof cautionIds)[number];

/** A caution to show, with where it comes from, in words. */
export interface Caution {
  id: CautionId;
  text: string;
  source: string;
}

/** Caution texts in our own words, each with its source as FIELD.md names it. */
export const cautions: Readonly<Record<CautionId, Caution>> = {
  levels: {
    id: 'levels',
    text:
      'Treat anything above 30 V rms, 42.4 V peak, 60 V DC or 45 µC of stored charge as hazardous live: ' +
      'touch-proof connectors, an enclosure, and no work on the circuit while it is powered.',
    source: 'Source: IEC 61010-1 (2nd ed., 2001), clause 6.3.1 — recalled clause, not yet checked against the text',
  },
  amplifier: {
    id: 'amplifier',
    text:
      'The amplifier behind a piezo is usually the dangerous part: its supply runs at 100–1000 V. ' +
      'Enclose it, limit its output current, fit bleeder resistors and use HV-rated connectors.',
    source: 'common practice',
  },
  discharge: {
    id: 'discharge',
    text:
      'Piezo elements hold charge for a long time and make charge when heated or loaded. ' +
      'Discharge them through a resistor of about 10 kΩ, never with a short.',
    source: 'Source: actuator vendor user manuals',
  },
  'supply-off': {
    id: 'supply-off',
    text: 'Connect and disconnect piezo elements with the supply off.',
    source: 'Source: actuator vendor user manuals',
  },
  'reverse-voltage': {
    id: 'reverse-voltage',
    text:
      "Don't exceed the element's reverse-voltage limit (it depoles), keep reverse fields well below " +
      'the coercive field, and don’t heat soft-PZT parts by soldering.',
    source: 'common practice',
  },
  'lead-dust': {
    id: 'lead-dust',
    text: 'Cutting or grinding PZT makes lead-bearing dust: wet-cut, and wash your hands.',
    source: 'common practice',
  },
  'local-codes': {
    id: 'local-codes',
    text: 'These notes do not replace local electrical codes or qualified practice; follow those first.',
    source: 'common practice',
  },
};

/** What a set of voltages trips: a hazardous voltage, a hazardous stored charge, or both. */
export interface SafetyFlags {
  highVoltage: boolean;
  storedCharge: boolean;
}

/** The flags, which levels were crossed (in words), and the cautions to show in order. */
export interface SafetyAssessment extends SafetyFlags {
  crossed: string[];
  cautions: Caution[];
}

const highVoltageCautions: readonly CautionId[] = ['levels', 'amplifier', 'supply-off', 'discharge', 'reverse-voltage'];
const storedChargeCautions: readonly CautionId[] = ['levels', 'discharge', 'supply-off'];

/** The cautions to show for a set of flags, in display order (empty when nothing is tripped). */
export function cautionsFor(flags: SafetyFlags): Caution[] {
  const ids = new Set<CautionId>([...(flags.highVoltage ? highVoltageCautions : []), ...(flags.storedCharge ? storedChargeCautions : [])]);
  if (ids.size > 0) ids.add('local-codes');
  return cautionIds.filter((id) => ids.has(id)).map((id) => cautions[id]);
}

const fmt = (v: number) => String(Number(v.toPrecision(3)));

/**
 * Judges voltages and charge against the IEC 61010-1 levels: a level is crossed when the value is
 * above it (equal is not above). Missing or non-finite values are ignored.
 */
export function assessSafety(exposure: VoltageExposure): SafetyAssessment {
  const L = HAZARDOUS_LIVE_LEVELS;
  const crossed: string[] = [];
  const over = (value: number | undefined, level: number, what: string, unit: string) => {
    if (value === undefined || !Number.isFinite(value)) return false;
    const a = Math.abs(value);
    if (a <= level) return false;
    crossed.push(`${fmt(a)} ${unit} ${what} is above the ${level === L.chargeC ? '45 µC' : `${level} ${unit}`} ${what} level`);
    return true;
  };
  const dc = over(exposure.dcV, L.dcV, 'DC', 'V');
  const peak = over(exposure.peakV, L.peakV, 'peak', 'V');
  const rms = over(exposure.rmsV, L.rmsV, 'rms', 'V');
  let storedCharge = false;
  if (exposure.chargeC !== undefined && Number.isFinite(exposure.chargeC) && Math.abs(exposure.chargeC) > L.chargeC) {
    storedCharge = true;
    crossed.push(`${fmt(Math.abs(exposure.chargeC) * 1e6)} µC stored is above the 45 µC level`);
  }
  const flags = { highVoltage: dc || peak || rms, storedCharge };
  return { ...flags, crossed, cautions: cautionsFor(flags) };
}

/** Largest |V| of a list (0 for an empty list), for pages that hold many voltages. */
export function largestMagnitude(volts: Iterable<number>): number {
  let m = 0;
  for (const v of volts) if (Number.isFinite(v) && Math.abs(v) > m) m = Math.abs(v);
  return m;
}

/** What the safety rule needs of an actuator: its stated limit and its runs' points. */
export interface ActuatorForSafety {
  maxVolts: number | null;
  runs?: readonly { voltageUnit: 'V' | 'mV'; points: readonly { volts: number }[] }[];
}

/**
 * The highest voltage an actuator is rated for or was driven at in its runs (V). A stated limit
 * bounds any waveform, so it is judged as a peak; run points are judged the same way (a run's
 * steps may be the extremes of a sweep).
 */
export function actuatorPeakVolts(a: ActuatorForSafety): number {
  let peak = a.maxVolts !== null && Number.isFinite(a.maxVolts) ? Math.abs(a.maxVolts) : 0;
  for (const run of a.runs ?? []) {
    const scale = run.voltageUnit === 'mV' ? 1e-3 : 1;
    for (const p of run.points) if (Math.abs(p.volts * scale) > peak) peak = Math.abs(p.volts * scale);
  }
  return peak;
}

/** The safety assessment of one actuator (limit and runs), with the part's capacitance when known. */
export function assessActuator(a: ActuatorForSafety, capacitanceNf?: number | null): SafetyAssessment {
  const peakV = actuatorPeakVolts(a);
  const c = capacitanceNf !== null && capacitanceNf !== undefined && capacitanceNf > 0 ? capacitanceNf * 1e-9 : null;
  return assessSafety({ peakV, chargeC: c === null ? undefined : c * peakV });
}

/**
 * Points of a run above the actuator's stated maximum volts (indices), for the mismatch warning:
 * either the points or the stated limit are wrong.
 */
export function pointsAboveLimit(
  points: readonly { volts: number }[],
  voltageUnit: 'V' | 'mV',
  maxVolts: number | null | undefined,
): number[] {
  if (maxVolts === null || maxVolts === undefined || !Number.isFinite(maxVolts)) return [];
  const scale = voltageUnit === 'mV' ? 1e-3 : 1;
  const out: number[] = [];
  points.forEach((p, i) => {
    if (Number.isFinite(p.volts) && Math.abs(p.volts * scale) > Math.abs(maxVolts)) out.push(i);
  });
  return out;
}
