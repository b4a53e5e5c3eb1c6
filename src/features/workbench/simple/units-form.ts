import { z } from 'zod';
import { unitConversionInput } from '@shared/schemas/workbench.ts';
import {
  convertDisplacement,
  displacementUnitLabels,
  displacementUnits,
  fromVolts,
  toVolts,
  voltageUnitLabels,
  voltageUnits,
} from '@shared/units.ts';

/** A displacement (the shared converter's value and unit) and a voltage to convert. */
export const unitsForm = z.object({
  length: unitConversionInput.pick({ value: true, from: true }),
  voltage: z.object({ value: z.number(), unit: z.enum(voltageUnits) }),
});

/** The displacement in every unit, and the voltage in V and mV. */
export function computeUnits(input: z.output<typeof unitsForm>) {
  const volts = toVolts(input.voltage.value, input.voltage.unit);
  return {
    lengths: displacementUnits.map((to) => ({ unit: displacementUnitLabels[to], value: convertDisplacement(input.length.value, input.length.from, to) })),
    voltages: voltageUnits.map((u) => ({ unit: voltageUnitLabels[u], value: fromVolts(volts, u) })),
  };
}
