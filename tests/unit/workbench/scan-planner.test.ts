import { describe, expect, it } from 'vitest';
import { bitsNeeded, dacResolution, frameTiming, lineRateCeilings, quasiStaticGainError } from '@shared/workbench/scan-planner.ts';

describe('scan planner', () => {
  it('when 102.6 nm/V spans 300 V at 16 bit, then the step is 0.47 nm [calc] (LSB formula [practice])', () => {
    const direct = dacResolution({ dacBits: 16, dacSpanV: 300, ampGainVPerV: 1, actuatorGainNmPerV: 102.6 });
    expect(direct.lsbNm).toBeCloseTo(0.47, 2);
    const amplified = dacResolution({ dacBits: 16, dacSpanV: 10, ampGainVPerV: 30, actuatorGainNmPerV: 102.6 });
    expect(amplified.lsbNm).toBeCloseTo(direct.lsbNm, 14);
    expect(amplified.rangeNm).toBeCloseTo(30780, 9);
    expect(amplified.outputSpanV).toBe(300);
  });

  it('when the range is 30 780 nm and the wanted step 0.47 nm, then 16 bits are needed [calc] (N ≥ log2(range/step) [practice])', () => {
    expect(bitsNeeded(30780, 0.47)).toBe(16);
  });

  it('when range/step is an exact power of two, then that many bits suffice (no off-by-one) [calc]', () => {
    expect(bitsNeeded(1024, 1)).toBe(10);
    expect(bitsNeeded(1025, 1)).toBe(11);
    expect(bitsNeeded(1, 2)).toBe(1);
  });

  it('when 256 lines run at 1 Hz (trace + retrace per line), then a frame takes 256 s', () => {
    const t = frameTiming({ pixelsPerLine: 256, lines: 256, lineRateHz: 1, scanSizeNm: 1000 });
    expect(t.frameTimeS).toBe(256);
    expect(t.pixelTimeS).toBeCloseTo(1 / 512, 15);
    expect(t.tipSpeedNmPerS).toBe(2000);
  });

  it('when f0 = 2 kHz, then ceilings are 200 Hz sine-like [practice] and 20 Hz triangular [S: Bae & Granick, RSI 71, 3955 (2000)]', () => {
    expect(lineRateCeilings(2000)).toEqual({ sineLikeHz: 200, triangleHz: 20 });
  });

  it('when driven at 0.1·f0, then the quasi-static gain error is +1 % [calc]', () => {
    expect(quasiStaticGainError(100, 1000) * 100).toBeCloseTo(1, 1);
    expect(quasiStaticGainError(0, 1000)).toBe(0);
    expect(() => quasiStaticGainError(1000, 1000)).toThrow(RangeError);
  });
});
