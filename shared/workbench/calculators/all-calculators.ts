// Every workbench calculator, in the order the API lists them. The server mounts one
// POST /api/workbench/<slug> per entry; a test walks the list and compares route and function.
import { creepCalculator } from './creep-calculator.ts';
import { expectedGainCalculator } from './expected-gain-calculator.ts';
import { fitCalculator } from './fit-calculator.ts';
import { mixingCalculator, mixingFitCalculator } from './mixing-calculators.ts';
import { peakToPeakCalculator } from './peak-to-peak-calculator.ts';
import { resonanceCalculator } from './resonance-calculator.ts';
import { scanPlanCalculator } from './scan-plan-calculator.ts';
import { convertCalculator, driveCurrentCalculator, tunnellingCalculator } from './simple-calculators.ts';
import { loadedGainCalculator } from './loaded-gain-calculator.ts';
import { tubeCalculator } from './tube-calculator.ts';
import { driveLimitsCalculator } from './drive-limits-calculator.ts';
import { noiseFloorCalculator } from './noise-floor-calculator.ts';
import { sineFitCalculator } from './sine-fit-calculator.ts';
import { lineariseCalculator } from './linearise-calculator.ts';
import { latticeCalculator } from './lattice-calculator.ts';

/** All calculators; add a new one here and it gets its route. */
export const calculators = [
  fitCalculator,
  peakToPeakCalculator,
  creepCalculator,
  expectedGainCalculator,
  mixingCalculator,
  mixingFitCalculator,
  scanPlanCalculator,
  resonanceCalculator,
  driveCurrentCalculator,
  tunnellingCalculator,
  convertCalculator,
  loadedGainCalculator,
  tubeCalculator,
  driveLimitsCalculator,
  noiseFloorCalculator,
  sineFitCalculator,
  lineariseCalculator,
  latticeCalculator,
] as const;
