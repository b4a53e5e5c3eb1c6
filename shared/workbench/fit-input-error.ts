// Input rules of the gain fit, as typed errors the API maps to 400 responses.

/** Fewest points a fit accepts: two parameters plus one degree of freedom for the residual SD. */
export const MIN_FIT_POINTS = 3;

/** Most points one API request may carry (the API contract; callers may raise it explicitly). */
export const MAX_FIT_POINTS = 100_000;

/** Machine-readable reasons a fit refuses its input (snake_case, as the API error codes are). */
export const fitInputErrorCodes = [
  'too_few_points',
  'too_many_points',
  'non_finite_value',
  'voltages_all_equal',
  'numeric_overflow',
] as const;

/** One of the fit's refusal reasons. */
export type FitInputErrorCode = (typeof fitInputErrorCodes)[number];

/** Where in the input the problem is, so a form can highlight the field. */
export interface FitInputErrorDetails {
  index?: number;
  field?: 'volts' | 'displacement';
}

/** Thrown by the fit for input it cannot use; the server turns it into a 400 with `code`. */
export class FitInputError extends Error {
  readonly code: FitInputErrorCode;
  readonly details: FitInputErrorDetails | undefined;

  constructor(code: FitInputErrorCode, message: string, details?: FitInputErrorDetails) {
    super(message);
    this.name = 'FitInputError';
    this.code = code;
    this.details = details;
  }
}
