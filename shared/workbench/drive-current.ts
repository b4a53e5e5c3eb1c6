// Drive current, reactive power and stored charge of a capacitive (piezo) load (FIELD.md
// "Drive electronics"). SI units throughout.

/** Vacuum permittivity ε0 (F/m), CODATA 2018. */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

/** A sine drive of peak amplitude V at frequency f into capacitance C. */
export interface SineDrive {
  capacitanceF: number;
  amplitudeV: number;
  frequencyHz: number;
}

/** What the amplifier must deliver for a sine drive into a capacitive load. */
export interface DriveCurrent {
  peakCurrentA: number;
  rmsCurrentA: number;
  rmsVoltageV: number;
  reactivePowerVar: number;
}

/**
 * I_pk = 2π·f·C·V [FIELD.md "Drive electronics"]; for a sine I_rms = I_pk/√2, V_rms = V/√2 and
 * the reactive power is V_rms·I_rms [calc]. Check [calc]: 3.4 nF at 100 V, 1 kHz → 2.1 mA.
 */
export function driveCurrent(d: SineDrive): DriveCurrent {
  const c = positive(d.capacitanceF, 'capacitance');
  const v = Math.abs(d.amplitudeV);
  if (!(d.frequencyHz >= 0)) throw new RangeError('frequency must not be negative');
  const peakCurrentA = 2 * Math.PI * d.frequencyHz * c * v;
  const rmsCurrentA = peakCurrentA / Math.SQRT2;
  const rmsVoltageV = v / Math.SQRT2;
  return { peakCurrentA, rmsCurrentA, rmsVoltageV, reactivePowerVar: rmsVoltageV * rmsCurrentA };
}

/** Charge Q = C·V and energy ½CV² left on the element at voltage V [FIELD.md "Drive electronics"]. */
export function storedCharge(capacitanceF: number, voltageV: number): { chargeC: number; energyJ: number } {
  const c = positive(capacitanceF, 'capacitance');
  const v = Math.abs(voltageV);
  return { chargeC: c * v, energyJ: 0.5 * c * v * v };
}

/** Coaxial tube capacitance C = 2π·ε0·εr·L/ln(OD/ID) [memory]. */
export function tubeCapacitanceF(g: { lengthM: number; outerDiameterM: number; innerDiameterM: number; relPermittivity: number }): number {
  const od = positive(g.outerDiameterM, 'outer diameter');
  const id = positive(g.innerDiameterM, 'inner diameter');
  if (id >= od) throw new RangeError('inner diameter must be smaller than outer diameter');
  return (
    (2 * Math.PI * VACUUM_PERMITTIVITY_F_PER_M * positive(g.relPermittivity, 'εr') * positive(g.lengthM, 'length')) / Math.log(od / id)
  );
}
