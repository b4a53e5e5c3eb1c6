// Input rules of the sine fit of a recorded drive and displacement, as typed errors the API maps to
// 400 responses (server/services/workbench.service.ts asBadRequest), like FitInputError for the gain fit.

/** Fewest samples a sine record may have: four parameters, degrees of freedom left for the residual SD, two periods at a few samples each [practice]. */
export const MIN_SINE_SAMPLES = 8;

/** Machine-readable reasons the sine fit refuses a record (snake_case, as the API error codes are). */
export const sineFitErrorCodes = [
  'too_few_samples',
  'too_many_samples',
  'non_finite_value',
  'times_not_increasing',
  'record_too_short',
  'no_clear_sine',
] as const;

/** One of the sine fit's refusal reasons. */
export type SineFitErrorCode = (typeof sineFitErrorCodes)[number];

/** Where in the record the problem is, so a page can point at the line. */
export interface SineFitErrorDetails {
  index?: number;
  field?: 'timeS' | 'volts' | 'displacement';
  periods?: number;
  explainedFraction?: number;
}

/** Thrown by the sine fit for a record it cannot use; the server turns it into a 400 with `code`. */
export class SineFitError extends Error {
  readonly code: SineFitErrorCode;
  readonly details: SineFitErrorDetails | undefined;

  constructor(code: SineFitErrorCode, message: string, details?: SineFitErrorDetails) {
    super(message);
    this.name = 'SineFitError';
    this.code = code;
    this.details = details;
  }
}
