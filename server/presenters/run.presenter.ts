import type { RunDto } from '@shared/schemas/run.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';

const parse = <T>(json: string | null): T | null => (json ? (JSON.parse(json) as T) : null);

/** A calibration run with the fit the server stored; points only when asked (detail views). */
export function presentRun(r: CalibrationRun, withPoints = true): RunDto {
  return {
    id: r.id,
    actuatorId: r.actuatorId,
    buildId: r.buildId,
    partId: r.partId,
    status: r.status,
    method: r.method,
    voltageUnit: r.voltageUnit,
    displacementUnit: r.displacementUnit,
    model: r.model,
    drive: parse(r.driveJson),
    conditions: parse(r.conditionsJson),
    notes: r.notes,
    fit: {
      n: r.pointCount,
      gainNmPerV: r.gainNmPerV,
      gainStdErrNmPerV: r.gainStdErrNmPerV ?? Number.NaN,
      gainCi95NmPerV: [r.gainCi95LoNmPerV ?? Number.NaN, r.gainCi95HiNmPerV ?? Number.NaN],
      interceptNm: r.interceptNm,
      r2: r.r2,
      residualStdNm: r.residualStdNm ?? Number.NaN,
      spanNm: r.spanNm,
      nonlinearityPctFs: r.nonlinearityPctFs,
      hysteresisPctFs: r.hysteresisPctFs,
    },
    points: withPoints ? (JSON.parse(r.pointsJson) as RunDto['points']) : [],
    reviewNote: r.reviewNote,
    createdAt: r.createdAt.toISOString(),
  };
}
