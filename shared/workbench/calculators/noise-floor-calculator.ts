// Noise-floor page and API: the amplifier's noise, the DAC's quantisation and a cantilever's thermal
// motion at the tip in nm rms, their total as independent sources, and which one sets the floor.
import { noiseFloorInput } from '../../schemas/workbench-extras.ts';
import { assessSafety } from '../safety.ts';
import { amplifierNoiseNm, dacQuantisationNm, rootSumSquare, thermalNoiseNm } from '../noise-floor.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** The noise sources the page adds up. */
export type NoiseSource = 'amplifier' | 'dac' | 'thermal';

/** One source's rms noise at the tip and its share of the total noise power. */
export interface NoiseTerm {
  source: NoiseSource;
  noiseNm: number;
  powerSharePct: number;
}

/** Each given noise term, their root-sum-square total, and the dominant source. */
export const noiseFloorCalculator = defineCalculator({
  slug: 'noise-floor',
  input: noiseFloorInput,
  compute(input) {
    const needsAmpGain = (term: string) => {
      if (input.ampGainVPerV === undefined) throw new RangeError(`The ${term} needs the amplifier gain (enter 1 if there is no amplifier)`);
      return input.ampGainVPerV;
    };
    let amplifierNm: number | null = null;
    if (input.noiseDensityVPerRtHz !== undefined || input.bandwidthHz !== undefined) {
      if (input.noiseDensityVPerRtHz === undefined || input.bandwidthHz === undefined) {
        throw new RangeError("The amplifier's noise needs both its noise density and the bandwidth");
      }
      amplifierNm = amplifierNoiseNm({
        noiseDensityVPerRtHz: input.noiseDensityVPerRtHz,
        bandwidthHz: input.bandwidthHz,
        ampGainVPerV: needsAmpGain("amplifier's noise"),
        actuatorGainNmPerV: input.actuatorGainNmPerV,
      });
    }
    let dac: ReturnType<typeof dacQuantisationNm> | null = null;
    if (input.dacBits !== undefined || input.dacSpanV !== undefined) {
      if (input.dacBits === undefined || input.dacSpanV === undefined)
        throw new RangeError("The DAC's quantisation needs both its bits and its span");
      dac = dacQuantisationNm({
        dacBits: input.dacBits,
        dacSpanV: input.dacSpanV,
        ampGainVPerV: needsAmpGain("DAC's quantisation"),
        actuatorGainNmPerV: input.actuatorGainNmPerV,
      });
    }
    let thermalNm: number | null = null;
    if (input.cantileverStiffnessNPerM !== undefined) {
      if (input.temperatureK === undefined) throw new RangeError("The cantilever's thermal noise needs the temperature");
      thermalNm = thermalNoiseNm(input.cantileverStiffnessNPerM, input.temperatureK);
    }
    const given: [NoiseSource, number | null][] = [
      ['amplifier', amplifierNm],
      ['dac', dac?.noiseNm ?? null],
      ['thermal', thermalNm],
    ];
    const present = given.filter((g): g is [NoiseSource, number] => g[1] !== null);
    if (present.length === 0) throw new RangeError('Enter at least one noise source: the amplifier, the DAC or a cantilever');
    const totalNoiseNm = rootSumSquare(present.map(([, x]) => x));
    const terms: NoiseTerm[] = present.map(([source, noiseNm]) => ({
      source,
      noiseNm,
      powerSharePct: totalNoiseNm > 0 ? (100 * noiseNm ** 2) / totalNoiseNm ** 2 : 0,
    }));
    const dominant = terms.reduce((a, b) => (b.noiseNm > a.noiseNm ? b : a));
    const warnings: ResultWarning[] = [];
    if (dac && dominant.source === 'dac') {
      // Bennett's Δ/√12 assumes the signal crosses many steps; a held code is a fixed error instead.
      warnings.push({
        code: 'quantisation_at_rest',
        message:
          `The DAC sets the floor. LSB/√12 holds while the drive crosses many codes; a tip held at one code does not ` +
          `jitter but sits up to half a step (${Number((dac.lsbNm / 2).toPrecision(2))} nm) off.`,
      });
    }
    // The DAC span through the amplifier is the largest voltage the actuator can be driven to.
    const safety = dac ? assessSafety({ peakV: dac.outputSpanV }) : null;
    return {
      amplifierNoiseNm: amplifierNm,
      dacLsbNm: dac?.lsbNm ?? null,
      dacQuantisationNoiseNm: dac?.noiseNm ?? null,
      thermalNoiseNm: thermalNm,
      totalNoiseNm,
      terms,
      dominant: dominant.source,
      dominantPowerSharePct: dominant.powerSharePct,
      outputSpanV: dac?.outputSpanV ?? null,
      highVoltage: safety?.highVoltage ?? false,
      levelsCrossed: safety?.crossed ?? [],
      warnings,
      cautions: safety?.cautions ?? [],
    };
  },
});
