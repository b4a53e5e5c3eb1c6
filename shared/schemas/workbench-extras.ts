// Inputs of the loaded-gain, tube, drive-limits and noise-floor calculators: one zod schema each,
// shared by the page forms and POST /api/workbench/<slug>. SI units unless the name says otherwise
// (the tube takes mm like the expected-gain tube). Which optional fields belong together is judged
// by each calculator, which refuses a half-given term with a RangeError (400 invalid_input).
import { z } from 'zod';

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();

/** A rectangular bender (SI), for its tip stiffness k = E·w·t³/(4L³). */
export const benderStiffnessInput = z.strictObject({
  lengthM: positive,
  widthM: positive,
  thicknessM: positive,
  youngsModulusPa: positive,
});

/** Actuator against a spring: free gain, the actuator's stiffness (entered or from a bender), the spring's rate and preload. */
export const loadedGainInput = z.strictObject({
  freeGainNmPerV: positive,
  actuatorStiffnessNPerM: positive.optional(),
  bender: benderStiffnessInput.optional(),
  springRateNPerM: nonNegative,
  preloadForceN: nonNegative.optional(),
});

/** Quartered piezo tube: geometry in mm, relative permittivity, Young's modulus and density (SI). */
export const tubeInput = z.strictObject({
  lengthMm: positive,
  outerDiameterMm: positive,
  wallMm: positive,
  relPermittivity: positive,
  youngsModulusPa: positive,
  densityKgPerM3: positive,
});

/** A sine drive into a piezo, an optional triangle raster, and the amplifier's limits (SI). */
export const driveLimitsInput = z.strictObject({
  capacitanceF: positive,
  amplitudeV: positive,
  frequencyHz: nonNegative,
  rasterSwingPpV: positive.optional(),
  lineRateHz: positive.optional(),
  currentLimitA: positive.optional(),
  slewRateVPerS: positive.optional(),
  outputResistanceOhm: positive.optional(),
});

/** Noise at the tip: actuator gain, and any of amplifier noise, DAC quantisation and cantilever thermal motion (SI). */
export const noiseFloorInput = z.strictObject({
  actuatorGainNmPerV: positive,
  ampGainVPerV: positive.optional(),
  noiseDensityVPerRtHz: positive.optional(),
  bandwidthHz: positive.optional(),
  dacBits: z.number().int().min(1).max(32).optional(),
  dacSpanV: positive.optional(),
  cantileverStiffnessNPerM: positive.optional(),
  temperatureK: positive.optional(),
});
