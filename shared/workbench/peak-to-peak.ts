// Peak-to-peak method for a sine drive: gain = Δx_pp / ΔV_pp, its uncertainty dominated by the
// reading resolution [practice; FIELD.md "Calibration fit"].
//
// Propagation used here (our choice, stated so the numbers can be checked):
// - Δx_pp is the difference of two readings (top and bottom of the swing), each within ±r/2 of
//   the truth for an indicator of resolution r. Worst case: Δx_pp is off by at most ±r.
//   Standard uncertainty: each reading rectangular with half-width r/2, u = (r/2)/√3 = r/√12;
//   the difference of two independent readings has u(Δx) = r/√6. Likewise u(ΔV) = r_V/√6 when
//   ΔV_pp is read as two values with resolution r_V.
//   [memory: JCGM 100:2008 (GUM) 4.3.7 rectangular distribution, 5.1.2 propagation law]
// - Relative standard uncertainties add in quadrature for a quotient:
//   u(g)/g = √((u(Δx)/Δx)² + (u(ΔV)/ΔV)²).
// - The worst-case bounds are exact, not linearised: [(Δx − r)/(ΔV + r_V), (Δx + r)/(ΔV − r_V)].

/** Inputs of the peak-to-peak method, all positive except the optional voltage resolution. */
export interface PeakToPeakInput {
  displacementPpNm: number;
  voltsPpV: number;
  displacementResolutionNm: number;
  voltsResolutionV?: number;
}

/** Gain from one sine-drive reading with both an uncertainty and hard bounds. */
export interface PeakToPeakResult {
  gainNmPerV: number;
  gainStdUncNmPerV: number;
  gainRelStdUnc: number;
  gainBoundsNmPerV: [number, number];
}

/** Computes gain and its resolution-limited uncertainty from a sine drive's peak-to-peak readings. */
export function peakToPeakGain(input: PeakToPeakInput): PeakToPeakResult {
  const { displacementPpNm: dx, voltsPpV: dv, displacementResolutionNm: rx } = input;
  const rv = input.voltsResolutionV ?? 0;
  if (!(dx > 0) || !(dv > 0)) throw new RangeError('peak-to-peak values must be positive');
  if (!(rx >= 0) || !(rv >= 0)) throw new RangeError('resolutions must not be negative');
  if (rv >= dv) throw new RangeError('voltage resolution must be smaller than the voltage swing');
  const gain = dx / dv;
  const ux = rx / Math.sqrt(6);
  const uv = rv / Math.sqrt(6);
  const rel = Math.hypot(ux / dx, uv / dv);
  return {
    gainNmPerV: gain,
    gainStdUncNmPerV: gain * rel,
    gainRelStdUnc: rel,
    gainBoundsNmPerV: [Math.max(0, dx - rx) / (dv + rv), (dx + rx) / (dv - rv)],
  };
}
