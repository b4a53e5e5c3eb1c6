// Expected-gain page and API: the free gain a geometry and material should give, its ±20 % material
// band, the band the geometry tolerances allow, and measured ÷ expected when a measurement is given.
import { expectedGainInput } from '../../schemas/workbench.ts';
import { EXPECTED_GAIN_BASIS, expectedGain, measuredToExpectedRatio, type ExpectedGainSpec } from '../expected-gain.ts';
import { expectedGainTolerance } from '../gain-tolerance.ts';
import { isMaterialKey, materials } from '../materials.ts';
import { defineCalculator } from './calculator.ts';

/** Coverage factor of the tolerance band (k = 2, about 95 % for a near-normal combination) [S: GUM 6.2–6.3]. */
export const TOLERANCE_COVERAGE_K = 2;

/** Expected gain, bands, the formula and its source, the material's source, and the comparison. */
export const expectedGainCalculator = defineCalculator({
  slug: 'expected-gain',
  input: expectedGainInput,
  compute(input) {
    const { measuredNmPerV, tolerances, ...spec } = input;
    const expected = expectedGain(spec as ExpectedGainSpec);
    const tol = tolerances ? expectedGainTolerance(spec as ExpectedGainSpec, tolerances) : null;
    return {
      ...expected,
      basis: EXPECTED_GAIN_BASIS[spec.actuator],
      materialSource: isMaterialKey(spec.material) ? materials[spec.material].source : null,
      tolerance: tol
        ? {
            gainStdUncNmPerV: tol.relStdUnc * expected.gainNmPerV,
            relStdUnc: tol.relStdUnc,
            coverageK: TOLERANCE_COVERAGE_K,
            lowNmPerV: expected.gainNmPerV * (1 - TOLERANCE_COVERAGE_K * tol.relStdUnc),
            highNmPerV: expected.gainNmPerV * (1 + TOLERANCE_COVERAGE_K * tol.relStdUnc),
            contributions: tol.contributions,
          }
        : null,
      comparison: measuredNmPerV === undefined ? null : { measuredNmPerV, ...measuredToExpectedRatio(measuredNmPerV, expected) },
      warnings: [],
      cautions: [],
    };
  },
});
