// Scan planning: DAC resolution, frame time and line-rate ceilings (FIELD.md "Drive electronics",
// "Resonance and scan speed").

/** The drive chain from DAC code to tip motion. */
export interface DriveChain {
  dacBits: number;
  dacSpanV: number;
  ampGainVPerV: number;
  actuatorGainNmPerV: number;
}

/**
 * Smallest step and full range of the chain: LSB = gain × amplifier gain × DAC span / 2^N
 * [practice]. FIELD check [calc]: 102.6 nm/V over 300 V at 16 bit → 0.47 nm.
 */
export function dacResolution(chain: DriveChain): { lsbNm: number; rangeNm: number; outputSpanV: number } {
  const { dacBits, dacSpanV, ampGainVPerV, actuatorGainNmPerV } = chain;
  if (!Number.isInteger(dacBits) || dacBits < 1 || dacBits > 53) throw new RangeError('dacBits must be 1–53');
  const outputSpanV = Math.abs(dacSpanV * ampGainVPerV);
  const rangeNm = Math.abs(actuatorGainNmPerV) * outputSpanV;
  return { lsbNm: rangeNm / 2 ** dacBits, rangeNm, outputSpanV };
}

/** Bits needed so that range / 2^N ≤ step: N = ⌈log2(range/step)⌉ [practice]. */
export function bitsNeeded(rangeNm: number, stepNm: number): number {
  if (!(rangeNm > 0) || !(stepNm > 0)) throw new RangeError('range and step must be positive');
  if (stepNm >= rangeNm) return 1;
  const bits = Math.ceil(Math.log2(rangeNm / stepNm));
  // Guard the ceiling against log2 rounding just above an exact power of two.
  return rangeNm / 2 ** (bits - 1) <= stepNm ? bits - 1 : bits;
}

/** Raster settings of one frame. */
export interface RasterSettings {
  pixelsPerLine: number;
  lines: number;
  lineRateHz: number;
  scanSizeNm?: number;
}

/**
 * Frame timing. Convention (chosen here and used across the site): the line rate counts trace
 * and retrace together, as SPM controllers usually quote it — one line period 1/f covers the trace
 * and the return, so frame time = lines / f and each pixel of the trace gets 1/(2·f·pixels).
 */
export function frameTiming(r: RasterSettings): { frameTimeS: number; pixelTimeS: number; tipSpeedNmPerS: number | null } {
  if (!(r.lineRateHz > 0) || !(r.lines >= 1) || !(r.pixelsPerLine >= 1)) {
    throw new RangeError('line rate, lines and pixels must be positive');
  }
  return {
    frameTimeS: r.lines / r.lineRateHz,
    pixelTimeS: 1 / (2 * r.lineRateHz * r.pixelsPerLine),
    tipSpeedNmPerS: r.scanSizeNm === undefined ? null : 2 * r.scanSizeNm * r.lineRateHz,
  };
}

/**
 * Line-rate ceilings from the first resonance f0: f0/10 for sine-like scans [practice] and f0/100
 * for sharp triangular rasters [S: Bae & Granick, Rev. Sci. Instrum. 71, 3955 (2000)].
 */
export function lineRateCeilings(resonanceHz: number): { sineLikeHz: number; triangleHz: number } {
  if (!(resonanceHz > 0)) throw new RangeError('resonance must be positive');
  return { sineLikeHz: resonanceHz / 10, triangleHz: resonanceHz / 100 };
}

/**
 * Quasi-static gain error of a lightly damped 2nd-order actuator driven below resonance:
 * 1/(1 − (f/f0)²) − 1 (a fraction; +0.0101 at 0.1·f0) [calc].
 */
export function quasiStaticGainError(frequencyHz: number, resonanceHz: number): number {
  if (!(resonanceHz > 0) || !(frequencyHz >= 0)) throw new RangeError('frequencies must be positive');
  if (frequencyHz >= resonanceHz) throw new RangeError('the quasi-static error is defined below resonance only');
  const ratio = frequencyHz / resonanceHz;
  return 1 / (1 - ratio * ratio) - 1;
}
