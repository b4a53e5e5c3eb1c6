// Drive-limits page and API: what a sine drive and a triangle raster ask of the amplifier (slew rate
// and current into the piezo's capacitance), the frequencies its limits allow, and the corner its
// output resistance makes with the load.
import { driveLimitsInput } from '../../schemas/workbench-extras.ts';
import {
  capacitiveCurrentA,
  currentLimitedLineRateHz,
  currentLimitedSineHz,
  rcAmplitudeRatio,
  rcCornerHz,
  sineSlewRateVPerS,
  slewLimitedLineRateHz,
  slewLimitedSineHz,
  triangleSlewRateVPerS,
} from '../drive-limits.ts';
import { assessSafety } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

const sig = (v: number) => Number(v.toPrecision(3));
const hz = (v: number) => (v >= 1000 ? `${sig(v / 1000)} kHz` : `${sig(v)} Hz`);

/** Slew rates and currents of the drive and raster, the frequency ceilings of the amplifier, and the RC corner. */
export const driveLimitsCalculator = defineCalculator({
  slug: 'drive-limits',
  input: driveLimitsInput,
  compute(input) {
    const { capacitanceF: c, amplitudeV: v, frequencyHz: f } = input;
    if ((input.rasterSwingPpV === undefined) !== (input.lineRateHz === undefined)) {
      throw new RangeError('Enter both the raster swing and its line rate, or neither');
    }
    const raster =
      input.rasterSwingPpV !== undefined && input.lineRateHz !== undefined
        ? { swingPpV: input.rasterSwingPpV, lineRateHz: input.lineRateHz }
        : null;
    const sineSlew = sineSlewRateVPerS(v, f);
    const rasterSlewRateVPerS = raster ? triangleSlewRateVPerS(raster.swingPpV, raster.lineRateHz) : null;
    const currentLimit = input.currentLimitA;
    const slewLimit = input.slewRateVPerS;
    const currentLimitedMaxHz = currentLimit === undefined ? null : currentLimitedSineHz(currentLimit, c, v);
    const slewLimitedMaxHz = slewLimit === undefined ? null : slewLimitedSineHz(slewLimit, v);
    const rasterCurrentLimitedLineRateHz =
      raster && currentLimit !== undefined ? currentLimitedLineRateHz(currentLimit, c, raster.swingPpV) : null;
    const rasterSlewLimitedLineRateHz = raster && slewLimit !== undefined ? slewLimitedLineRateHz(slewLimit, raster.swingPpV) : null;
    const cornerHz = input.outputResistanceOhm === undefined ? null : rcCornerHz(input.outputResistanceOhm, c);

    const warnings: ResultWarning[] = [];
    const over = (code: string, asked: string, askedHz: number, limitHz: number | null, limit: string) => {
      if (limitHz !== null && askedHz > limitHz) {
        warnings.push({
          code,
          message: `${asked} ${hz(askedHz)} is above the ${hz(limitHz)} ${limit} allows: the amplifier cannot follow it and the drive distorts.`,
        });
      }
    };
    over('sine_over_current_limit', 'The sine at', f, currentLimitedMaxHz, 'its current limit');
    over('sine_over_slew_limit', 'The sine at', f, slewLimitedMaxHz, 'its slew rate');
    if (raster) {
      over('raster_over_current_limit', 'A line rate of', raster.lineRateHz, rasterCurrentLimitedLineRateHz, 'its current limit');
      over('raster_over_slew_limit', 'A line rate of', raster.lineRateHz, rasterSlewLimitedLineRateHz, 'its slew rate');
    }
    if (cornerHz !== null && f > cornerHz) {
      warnings.push({
        code: 'above_rc_corner',
        message: `The sine at ${hz(f)} is above the ${hz(cornerHz)} corner of the output resistance with the load: the piezo sees less than 71 % of the amplitude.`,
      });
    }

    // A raster's swing may sit anywhere between 0 and V_pp; take the larger voltage as its peak.
    const peakV = Math.max(v, raster?.swingPpV ?? 0);
    const safety = assessSafety({ peakV, chargeC: c * peakV });
    return {
      sineSlewRateVPerS: sineSlew,
      sinePeakCurrentA: capacitiveCurrentA(c, sineSlew),
      rasterSlewRateVPerS,
      rasterCurrentA: rasterSlewRateVPerS === null ? null : capacitiveCurrentA(c, rasterSlewRateVPerS),
      currentLimitedMaxHz,
      slewLimitedMaxHz,
      rasterCurrentLimitedLineRateHz,
      rasterSlewLimitedLineRateHz,
      rcCornerHz: cornerHz,
      rcAmplitudeRatio: cornerHz === null ? null : rcAmplitudeRatio(f, cornerHz),
      storedChargeC: c * peakV,
      highVoltage: safety.highVoltage,
      storedCharge: safety.storedCharge,
      levelsCrossed: safety.crossed,
      warnings,
      cautions: safety.cautions,
    };
  },
});
