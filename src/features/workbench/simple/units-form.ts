import { z } from 'zod';
import { convertCalculator } from '@shared/workbench/calculators/simple-calculators.ts';
import { displacementUnits, gainUnits, voltageUnits } from '@shared/units.ts';

const quantity = <U extends readonly [string, ...string[]]>(units: U) => z.object({ value: z.number(), from: z.enum(units) });

/** A displacement, a voltage and a gain, each with the unit it is written in. */
export const unitsForm = z.object({
  length: quantity(displacementUnits),
  voltage: quantity(voltageUnits),
  gain: quantity(gainUnits),
});

/** Each quantity in every unit of its kind: three calls of the shared converter, as the API answers each. */
export function computeUnits(input: z.output<typeof unitsForm>) {
  const all = (q: {
    value: number;
    from: (typeof displacementUnits)[number] | (typeof voltageUnits)[number] | (typeof gainUnits)[number];
  }) => convertCalculator.compute({ value: q.value, from: q.from, to: q.from }).inEveryUnit;
  return { lengths: all(input.length), voltages: all(input.voltage), gains: all(input.gain) };
}
