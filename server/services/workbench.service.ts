// Runs a shared workbench calculator for the API: the calculator composes the whole result (see
// shared/workbench/calculators/); this turns its input refusals into 400s. Nothing is stored.
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import { SineFitError } from '@shared/workbench/sine-fit-error.ts';
import { asSentence } from '@shared/format/sentence.ts';
import { AppError } from '../errors.ts';

/** Some number inside is NaN or ±Infinity, which JSON would silently turn into null. */
function hasNonFinite(value: unknown): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (Array.isArray(value)) return value.some(hasNonFinite);
  return value !== null && typeof value === 'object' && Object.values(value).some(hasNonFinite);
}

const errorCode = (err: RangeError): string => {
  const code = (err as RangeError & { code?: unknown }).code;
  return typeof code === 'string' ? code : 'invalid_input';
};

/**
 * Run a shared calculation, turning its input refusals into 400s with the refusal's own code;
 * inputs so extreme that a result overflows double precision are refused too (400 out_of_range).
 */
export function asBadRequest<T>(compute: () => T): T {
  let result: T;
  try {
    result = compute();
  } catch (err) {
    if (err instanceof FitInputError) throw new AppError(400, err.code, err.message, err.details);
    if (err instanceof SineFitError) throw new AppError(400, err.code, err.message, err.details);
    if (err instanceof RangeError) throw new AppError(400, errorCode(err), asSentence(err.message));
    throw err;
  }
  if (hasNonFinite(result))
    throw new AppError(400, 'out_of_range', 'These values are too large or too small to calculate with; try other units.');
  return result;
}
