// Cantilever resonance page and API: the first bending mode, with a tip mass when one is given, and
// the line-rate ceilings of the mode that actually moves (the loaded one).
import { resonanceInput } from '../../schemas/workbench.ts';
import { cantileverSpringConstantNPerM, rectangularBeamMassKg, rectangularCantileverHz, tipMassCorrectedHz } from '../resonance.ts';
import { lineRateCeilings } from '../scan-planner.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/**
 * Euler–Bernoulli ignores shear and rotary inertia; below a length-to-thickness ratio of about 10
 * the first mode it predicts is noticeably too high (Timoshenko beam theory) [practice; the ratio
 * is the usual rule of thumb].
 */
export const THICK_BEAM_RATIO = 10;

/** First mode (bare and loaded), spring constant, beam mass, and the loaded mode's line-rate ceilings. */
export const resonanceCalculator = defineCalculator({
  slug: 'resonance',
  input: resonanceInput,
  compute(input) {
    const firstModeHz = rectangularCantileverHz(input);
    const tipMassKg = input.tipMassKg ?? 0;
    if (input.widthM === undefined && tipMassKg > 0) {
      throw new RangeError('Enter the width too: the tip-mass correction needs the beam mass');
    }
    const beam = input.widthM === undefined ? null : { ...input, widthM: input.widthM };
    const beamMassKg = beam ? rectangularBeamMassKg(beam) : null;
    const withTipMassHz = beamMassKg !== null && tipMassKg > 0 ? tipMassCorrectedHz(firstModeHz, beamMassKg, tipMassKg) : null;
    const movingModeHz = withTipMassHz ?? firstModeHz;
    const ceilings = lineRateCeilings(movingModeHz);
    const slenderness = input.lengthM / input.thicknessM;
    const warnings: ResultWarning[] = [];
    if (slenderness < THICK_BEAM_RATIO) {
      warnings.push({
        code: 'thick_beam',
        message: `Length is only ${Number(slenderness.toPrecision(2))}× the thickness: below about 10× a thin-beam (Euler–Bernoulli) model overestimates f₁; treat it as an upper bound.`,
      });
    }
    return {
      /** The bare beam's first mode. */
      firstModeHz,
      withTipMassHz,
      /** The first mode that moves and sets the ceilings: with the tip mass when one is given. */
      movingModeHz,
      springConstantNPerM: beam ? cantileverSpringConstantNPerM(beam) : null,
      beamMassKg,
      lengthToThickness: slenderness,
      lineRateCeilingSineLikeHz: ceilings.sineLikeHz,
      lineRateCeilingTriangleHz: ceilings.triangleHz,
      warnings,
      cautions: [],
    };
  },
});
