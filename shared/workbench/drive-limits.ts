// What a drive asks of the amplifier behind a piezo (a capacitance): slew rate and current of a
// sine or a triangle raster, the frequencies its current and slew-rate limits allow, and the corner
// its output resistance makes with the load. SI units throughout.

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive`);
  return value;
}

function nonNegative(value: number, name: string): number {
  if (!(value >= 0) || !Number.isFinite(value)) throw new RangeError(`${name} must not be negative`);
  return value;
}

/** Steepest slope of V_pk·sin(2πft): 2π·f·V_pk, at the zero crossings [calc]. */
export function sineSlewRateVPerS(amplitudeV: number, frequencyHz: number): number {
  return 2 * Math.PI * nonNegative(frequencyHz, 'frequency') * positive(amplitudeV, 'amplitude');
}

/**
 * Slope of a triangle raster of peak-to-peak swing V_pp at line rate f, the line period covering
 * trace and retrace (as the scan planner counts it): V_pp in each half period, so 2·V_pp·f [calc].
 */
export function triangleSlewRateVPerS(swingPpV: number, lineRateHz: number): number {
  return 2 * positive(swingPpV, 'raster swing') * positive(lineRateHz, 'line rate');
}

/** Current into a capacitance slewed at dV/dt: I = C·dV/dt [calc]. */
export function capacitiveCurrentA(capacitanceF: number, slewRateVPerS: number): number {
  return positive(capacitanceF, 'capacitance') * nonNegative(slewRateVPerS, 'slew rate');
}

/** Highest sine frequency a current limit allows: I_max = 2π·f·C·V_pk solved for f [calc]. */
export function currentLimitedSineHz(currentLimitA: number, capacitanceF: number, amplitudeV: number): number {
  return (
    positive(currentLimitA, 'current limit') / (2 * Math.PI * positive(capacitanceF, 'capacitance') * positive(amplitudeV, 'amplitude'))
  );
}

/** Highest sine frequency a slew-rate limit allows: SR = 2π·f·V_pk solved for f [calc]. */
export function slewLimitedSineHz(slewRateVPerS: number, amplitudeV: number): number {
  return positive(slewRateVPerS, 'slew rate') / (2 * Math.PI * positive(amplitudeV, 'amplitude'));
}

/** Highest triangle line rate a current limit allows: I_max = C·2·V_pp·f solved for f [calc]. */
export function currentLimitedLineRateHz(currentLimitA: number, capacitanceF: number, swingPpV: number): number {
  return positive(currentLimitA, 'current limit') / (2 * positive(capacitanceF, 'capacitance') * positive(swingPpV, 'raster swing'));
}

/** Highest triangle line rate a slew-rate limit allows: SR = 2·V_pp·f solved for f [calc]. */
export function slewLimitedLineRateHz(slewRateVPerS: number, swingPpV: number): number {
  return positive(slewRateVPerS, 'slew rate') / (2 * positive(swingPpV, 'raster swing'));
}

/** Corner of the amplifier's output resistance with the load: f_c = 1/(2π·R_out·C) [calc; first-order low-pass]. */
export function rcCornerHz(outputResistanceOhm: number, capacitanceF: number): number {
  return 1 / (2 * Math.PI * positive(outputResistanceOhm, 'output resistance') * positive(capacitanceF, 'capacitance'));
}

/** Amplitude left at f behind that corner: |H| = 1/√(1 + (f/f_c)²) [calc; first-order low-pass]. */
export function rcAmplitudeRatio(frequencyHz: number, cornerHz: number): number {
  const x = nonNegative(frequencyHz, 'frequency') / positive(cornerHz, 'corner frequency');
  return 1 / Math.sqrt(1 + x * x);
}
