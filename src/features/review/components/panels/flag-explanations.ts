// Why each plausibility flag matters and what to look at, built from the thresholds in shared/review/plausibility.ts.
import {
  EXPECTED_RATIO_BAND,
  FEW_POINTS,
  LARGE_HYSTERESIS_PCT,
  POOR_FIT_R2,
  ROBUST_Z_LIMIT,
  type FlagCode,
} from '@shared/review/plausibility.ts';

export const flagTitles: Record<FlagCode, string> = {
  'poor-fit': 'Poor straight-line fit',
  'few-points': 'Few points',
  'large-hysteresis': 'Large hysteresis',
  outlier: 'Far from the part’s accepted runs',
  'unit-slip': 'Possible unit slip',
  'expected-mismatch': 'Far from the expected gain',
};

export const flagExplanations: Record<FlagCode, string> = {
  'poor-fit': `A piezo read on an indicator over its range is nearly straight; hysteresis alone keeps R² above about ${POOR_FIT_R2}. Look in the plot for a misread or slipped reading.`,
  'few-points': `With fewer than ${FEW_POINTS} points the up and down sweeps cannot each show a middle point, so hysteresis and nonlinearity say little.`,
  'large-hysteresis': `Open-loop piezo ceramic shows about 10–15 % of span at full drive; above ${LARGE_HYSTERESIS_PCT} % a loose mount, indicator backlash or creep between readings is likely.`,
  outlier: `The gain’s modified z-score against this part’s accepted runs is beyond ${ROBUST_Z_LIMIT} (Iglewicz–Hoaglin). Check that the part is the one named and how it is driven.`,
  'unit-slip':
    'The ratio to the part median is close to 25.4, 1000, 10, 2 or 2√2 (or their inverses): readings in µm, mil, Å ' +
    'or mV entered as nm or V, a peak amplitude taken for peak-to-peak, or an rms reading for peak-to-peak.',
  'expected-mismatch':
    `Measured ÷ expected from geometry lies outside ${EXPECTED_RATIO_BAND[0]}–${EXPECTED_RATIO_BAND[1]}. Free-gain ` +
    `formulas overestimate clamped parts, but rarely by more than ×4; check geometry, material and drive.`,
};
