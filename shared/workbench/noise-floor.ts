// Noise at the tip, in nm rms: the amplifier's own noise, the DAC's quantisation, and the thermal
// motion of a cantilever, added as independent sources. SI units in, nm out.
import { dacResolution, type DriveChain } from './scan-planner.ts';

/** Boltzmann constant k_B in J/K, exact since the 2019 SI redefinition [S: BIPM, The International System of Units, 9th ed. (2019)]. */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

/** The amplifier's input-referred noise over a bandwidth, through its gain and the actuator's. */
export interface AmplifierNoise {
  noiseDensityVPerRtHz: number;
  bandwidthHz: number;
  ampGainVPerV: number;
  actuatorGainNmPerV: number;
}

/**
 * White noise of density e_n (V/√Hz) over a bandwidth B is e_n·√B rms; the amplifier's gain and the
 * actuator's carry it to the tip: e_n·√B·G·g nm [calc; white noise assumed, B the noise bandwidth].
 */
export function amplifierNoiseNm(a: AmplifierNoise): number {
  return (
    positive(a.noiseDensityVPerRtHz, 'noise density') *
    Math.sqrt(positive(a.bandwidthHz, 'bandwidth')) *
    positive(a.ampGainVPerV, 'amplifier gain') *
    positive(a.actuatorGainNmPerV, 'actuator gain')
  );
}

/**
 * A uniform quantiser of step Δ adds noise of rms Δ/√12 when the signal spans many steps
 * [S: W. R. Bennett, "Spectra of quantized signals", Bell Syst. Tech. J. 27, 446 (1948)];
 * Δ = actuator gain × amplifier gain × DAC span / 2^N, from the scan planner [practice].
 */
export function dacQuantisationNm(chain: DriveChain): { lsbNm: number; noiseNm: number; outputSpanV: number } {
  const { lsbNm, outputSpanV } = dacResolution(chain);
  return { lsbNm, noiseNm: lsbNm / Math.sqrt(12), outputSpanV };
}

/**
 * Thermal motion of a spring k at temperature T: ½k⟨z²⟩ = ½k_B·T, so z_rms = √(k_B·T/k)
 * [S: equipartition theorem; FIELD.md check 0.1 N/m, 295 K → 0.20 nm, calc].
 */
export function thermalNoiseNm(stiffnessNPerM: number, temperatureK: number): number {
  return Math.sqrt((BOLTZMANN_J_PER_K * positive(temperatureK, 'temperature')) / positive(stiffnessNPerM, 'spring constant')) * 1e9;
}

/** Independent noise sources add in power: total = √(Σ xᵢ²) [calc]. */
export function rootSumSquare(values: readonly number[]): number {
  return Math.sqrt(values.reduce((sum, x) => sum + x * x, 0));
}
