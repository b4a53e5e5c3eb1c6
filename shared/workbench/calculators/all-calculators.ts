// Every workbench calculator, in the order the API lists them. The server mounts one
// POST /api/workbench/<slug> per entry; a test walks the list and compares route and function.
import { resonanceCalculator } from './resonance-calculator.ts';

/** All calculators; add a new one here and it gets its route. */
export const calculators = [resonanceCalculator] as const;
