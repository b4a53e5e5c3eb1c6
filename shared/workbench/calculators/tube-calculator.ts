// Piezo-tube page and API: quadrant and whole-tube capacitance, and the first bending and axial
// resonances of the tube clamped at one end.
import { tubeInput } from '../../schemas/workbench-extras.ts';
import { axialModeHz, tubeBendingModeHz, tubeCapacitances, tubeDiametersM } from '../tube.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/**
 * Below a length of about twice the outer diameter a tube is too short for a thin-beam model: shear
 * and the clamp dominate and the bending mode it predicts is too high [practice].
 */
export const SHORT_TUBE_RATIO = 2;

/** Capacitances, bending and axial modes, and the length-to-diameter ratio of a quartered tube. */
export const tubeCalculator = defineCalculator({
  slug: 'tube',
  input: tubeInput,
  compute(input) {
    const d = tubeDiametersM(input);
    const lengthToDiameter = input.lengthMm / input.outerDiameterMm;
    const warnings: ResultWarning[] = [];
    if (lengthToDiameter < SHORT_TUBE_RATIO) {
      warnings.push({
        code: 'short_tube',
        message: `The tube is only ${Number(lengthToDiameter.toPrecision(2))}× as long as it is wide: below about 2× the beam model is poor and the bending mode is an upper bound.`,
      });
    }
    return {
      innerDiameterMm: input.outerDiameterMm - 2 * input.wallMm,
      ...tubeCapacitances(input),
      bendingModeHz: tubeBendingModeHz(input),
      axialModeHz: axialModeHz(d.lengthM, input),
      lengthToDiameter,
      warnings,
      cautions: [],
    };
  },
});
