// Loaded-gain page and API: what is left of an actuator's free gain against a spring (a dial
// indicator on a bender, a flexure), and how far the spring's preload pushes it back.
import { loadedGainInput } from '../../schemas/workbench-extras.ts';
import { benderStiffnessNPerM, loadedGain, preloadDeflectionNm } from '../loaded-gain.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** Loss above which the spring is stiffer than the actuator and the reading says more about the spring. */
export const STIFF_SPRING_LOSS_PCT = 50;

/** Loaded gain and its loss, the actuator stiffness used, and the deflection under the preload. */
export const loadedGainCalculator = defineCalculator({
  slug: 'loaded-gain',
  input: loadedGainInput,
  compute(input) {
    if (input.actuatorStiffnessNPerM !== undefined && input.bender !== undefined) {
      throw new RangeError("Enter the actuator's stiffness or the bender's geometry, not both");
    }
    if (input.actuatorStiffnessNPerM === undefined && input.bender === undefined) {
      throw new RangeError("Enter the actuator's stiffness, or the bender's geometry to compute it");
    }
    const actuatorStiffnessNPerM = input.actuatorStiffnessNPerM ?? benderStiffnessNPerM(input.bender!);
    const { loadedGainNmPerV, gainLossPct } = loadedGain(input.freeGainNmPerV, actuatorStiffnessNPerM, input.springRateNPerM);
    const warnings: ResultWarning[] = [];
    if (gainLossPct > STIFF_SPRING_LOSS_PCT) {
      warnings.push({
        code: 'spring_stiffer_than_actuator',
        message:
          `The spring is stiffer than the actuator: it takes ${Number(gainLossPct.toPrecision(2))} % of the free gain. ` +
          `Use a lighter indicator or a stiffer actuator; small errors in either stiffness now move the result a lot.`,
      });
    }
    return {
      freeGainNmPerV: input.freeGainNmPerV,
      actuatorStiffnessNPerM,
      stiffnessFromBender: input.bender !== undefined,
      springRateNPerM: input.springRateNPerM,
      springToActuatorRatio: input.springRateNPerM / actuatorStiffnessNPerM,
      loadedGainNmPerV,
      gainLossPct,
      preloadDeflectionNm: input.preloadForceN === undefined ? null : preloadDeflectionNm(input.preloadForceN, actuatorStiffnessNPerM),
      warnings,
      cautions: [],
    };
  },
});
