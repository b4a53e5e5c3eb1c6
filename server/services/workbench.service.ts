import { fitCalibrationInUnits, toFitResultDto } from '@shared/workbench/calibration-fit.ts';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import type { FitInput, FitResultDto } from '@shared/schemas/workbench.ts';
import { AppError } from '../errors.ts';

/** Run a shared calculation, turning its input refusals into 400s with the refusal's own code. */
export function asBadRequest<T>(compute: () => T): T {
  try {
    return compute();
  } catch (err) {
    if (err instanceof FitInputError) throw new AppError(400, err.code, err.message, err.details);
    if (err instanceof RangeError) throw new AppError(400, 'invalid_input', err.message);
    throw err;
  }
}

/** The calibration fit exactly as runs store it: same shared code, same DTO. */
export function computeFit(input: FitInput): FitResultDto {
  return asBadRequest(() => toFitResultDto(fitCalibrationInUnits(input)));
}
