import type { LatticeRunFiguresDto } from '@shared/schemas/lattice.ts';
import type { PeakToPeakReadingDto, RunDto, RunPlotPoint, SineRecordFitDto } from '@shared/schemas/run.ts';
import { thinPlot } from '@shared/workbench/run-fit.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';

const parse = <T>(json: string | null): T | null => (json ? (JSON.parse(json) as T) : null);

/** Kind-specific figures stored beside the fit columns (detail_json). */
export interface RunDetail {
  reading?: PeakToPeakReadingDto;
  gainBoundsNmPerV?: [number, number];
  sine?: SineRecordFitDto;
  lattice?: LatticeRunFiguresDto;
}

/** The run columns a presenter reads: every column but the raw record. */
export const RUN_READ_COLUMNS = [
  'id',
  'actuatorId',
  'buildId',
  'partId',
  'ownerId',
  'status',
  'kind',
  'measuredOn',
  'detailJson',
  'plotJson',
  'method',
  'voltageUnit',
  'displacementUnit',
  'model',
  'driveJson',
  'conditionsJson',
  'notes',
  'pointCount',
  'gainNmPerV',
  'gainStdErrNmPerV',
  'gainCi95LoNmPerV',
  'gainCi95HiNmPerV',
  'interceptNm',
  'r2',
  'residualStdNm',
  'spanNm',
  'nonlinearityPctFs',
  'hysteresisPctFs',
  'reviewNote',
  'reviewedById',
  'reviewedAt',
  'createdAt',
  'updatedAt',
] as const;

/**
 * A calibration run with the fit the server stored and its plot series (never the raw record: that is
 * in the export). `plotMax` thins the series further where a page shows many runs.
 */
export function presentRun(r: CalibrationRun, plotMax?: number): RunDto {
  const detail = parse<RunDetail>(r.detailJson) ?? {};
  const stored = parse<RunPlotPoint[]>(r.plotJson) ?? [];
  const points = plotMax !== undefined && stored.length > plotMax ? thinPlot(stored, plotMax) : stored;
  const hasCi = r.gainCi95LoNmPerV !== null && r.gainCi95HiNmPerV !== null;
  return {
    id: r.id,
    actuatorId: r.actuatorId,
    buildId: r.buildId,
    partId: r.partId,
    kind: r.kind,
    status: r.status,
    method: r.method,
    voltageUnit: r.voltageUnit,
    displacementUnit: r.displacementUnit,
    model: r.model,
    drive: parse(r.driveJson),
    conditions: parse(r.conditionsJson),
    notes: r.notes,
    measuredOn: r.measuredOn,
    fit: {
      n: r.pointCount,
      gainNmPerV: r.gainNmPerV,
      gainStdErrNmPerV: r.gainStdErrNmPerV ?? Number.NaN,
      gainStdUncertaintyNmPerV: r.gainStdErrNmPerV ?? Number.NaN,
      gainCi95NmPerV: hasCi ? [r.gainCi95LoNmPerV!, r.gainCi95HiNmPerV!] : null,
      interceptNm: r.interceptNm,
      r2: r.r2,
      residualStdNm: r.residualStdNm ?? Number.NaN,
      spanNm: r.spanNm,
      nonlinearityPctFs: r.nonlinearityPctFs,
      hysteresisPctFs: r.hysteresisPctFs,
      ...(detail.gainBoundsNmPerV ? { gainBoundsNmPerV: detail.gainBoundsNmPerV } : {}),
      ...(detail.sine ? { sine: detail.sine } : {}),
      ...(detail.lattice ? { lattice: detail.lattice } : {}),
    },
    pointCount: r.pointCount,
    points,
    decimated: points.length < r.pointCount && r.kind !== 'peak-to-peak' && r.kind !== 'lattice',
    reading: detail.reading ?? null,
    reviewNote: r.reviewNote,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}
