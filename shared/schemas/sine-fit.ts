// Input of the sine fit (workbench page, POST /api/workbench/sine-fit and sine-record runs): a record of
// time, drive volts and displacement in the units the maker recorded them in. zod 4's z.number()
// rejects NaN and ±Infinity; the fit's own rules (times increasing, two periods, a clear sine) are
// SineFitError refusals (shared/workbench/sine-fit-error.ts), which the server maps to 400s.
import { z } from 'zod';
import { displacementUnits, voltageUnits } from '../units.ts';
import { MIN_SINE_SAMPLES } from '../workbench/sine-fit-error.ts';

/** Most samples one sine record may carry (the API contract and the run limit of issue 12). */
export const MAX_SINE_SAMPLES = 200_000;

/** One sample of a sine record: time in seconds, drive and displacement in the record's units. */
export const sineSample = z.strictObject({ timeS: z.number(), volts: z.number(), displacement: z.number() });

/** One sample as the fit receives it. */
export type SineSample = z.infer<typeof sineSample>;

/** Body of the sine-fit API and the sine-fit page; `frequencyHz` when the drive frequency is known. */
export const sineFitInput = z.strictObject({
  samples: z.array(sineSample).min(MIN_SINE_SAMPLES).max(MAX_SINE_SAMPLES),
  voltageUnit: z.enum(voltageUnits).default('V'),
  displacementUnit: z.enum(displacementUnits),
  frequencyHz: z.number().positive().optional(),
});

/** Parsed (defaults applied) SineFitInput as the fit, the service and the page receive it. */
export type SineFitInput = z.infer<typeof sineFitInput>;
