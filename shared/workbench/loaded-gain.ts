// An actuator working against a spring, such as a dial indicator's spring pressing on a bender:
// the gain that is left, and how far the indicator's preload pushes the actuator back before any
// drive. SI units in; displacements out in nm.
import { loadedGainNmPerV } from './expected-gain.ts';
import { cantileverSpringConstantNPerM, type RectangularBeamWithWidth } from './resonance.ts';

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

/** The gain against a spring and the share of the free gain the spring takes. */
export interface LoadedGain {
  loadedGainNmPerV: number;
  gainLossPct: number;
}

/**
 * Loaded gain g·kₐ/(kₐ + kₛ) [memory, FIELD.md]. It follows from two springs in series: the
 * actuator is a free stroke δ₀ behind its own stiffness kₐ, so force balance kₐ·(δ₀ − δ) = kₛ·δ
 * gives δ = δ₀·kₐ/(kₐ + kₛ), and the loss is kₛ/(kₐ + kₛ) [calc].
 */
export function loadedGain(freeGainNmPerV: number, actuatorStiffnessNPerM: number, springRateNPerM: number): LoadedGain {
  const g = positive(freeGainNmPerV, 'free gain');
  const loaded = loadedGainNmPerV(g, actuatorStiffnessNPerM, springRateNPerM);
  return {
    loadedGainNmPerV: loaded,
    gainLossPct: (100 * springRateNPerM) / (actuatorStiffnessNPerM + springRateNPerM),
  };
}

/**
 * Static deflection of the actuator under the force F the indicator presses with at its resting
 * reading: F/kₐ (Hooke's law on the actuator's own stiffness) [calc]. Taking F as fixed ignores the
 * small drop in the indicator's force as the actuator yields (kₛ·F/kₐ), fine while kₛ ≪ kₐ.
 */
export function preloadDeflectionNm(forceN: number, actuatorStiffnessNPerM: number): number {
  if (!(forceN >= 0) || !Number.isFinite(forceN)) throw new RangeError('preload force must not be negative');
  return (forceN / positive(actuatorStiffnessNPerM, 'actuator stiffness')) * 1e9;
}

/**
 * Tip stiffness of a rectangular bender clamped at one end: k = E·w·t³/(4L³) = 3EI/L³
 * [S: Timoshenko, Vibration Problems in Engineering; FIELD.md check 41.5 N/m]. A bimorph's layers
 * and shim are taken as one material of modulus E [practice].
 */
export function benderStiffnessNPerM(bender: Omit<RectangularBeamWithWidth, 'densityKgPerM3'>): number {
  return cantileverSpringConstantNPerM({ ...bender, densityKgPerM3: 1 }); // density does not enter k
}
