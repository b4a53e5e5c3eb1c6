import type { QueueBuildDto, QueuePartDto, QueueReportDto, QueueRunDto, ReviewAuthorDto } from '@shared/schemas/review.ts';
import { plausibilityFlags } from '@shared/review/plausibility.ts';
import { expectedGainForPart } from '@shared/workbench/part-expected-gain.ts';
import { toNm, toVolts } from '@shared/units.ts';
import type { Build } from '../models/build.model.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';
import type { Actuator } from '../models/actuator.model.ts';
import type { Part } from '../models/part.model.ts';
import type { Report } from '../models/report.model.ts';
import { presentRun } from './run.presenter.ts';
import { presentPartSummary } from './part.presenter.ts';

/** Per-build counts the desk shows on a build card. */
export interface QueueBuildCounts {
  photoCount: number;
  entryCount: number;
  actuatorCount: number;
  pendingRunCount: number;
}

/** A submitted or edited build on the desk. */
export function presentQueueBuild(b: Build, author: ReviewAuthorDto, counts: QueueBuildCounts): QueueBuildDto {
  return {
    id: b.id,
    title: b.title,
    instrumentKind: b.instrumentKind,
    summary: b.summary,
    author,
    submittedAt: b.submittedAt?.toISOString() ?? null,
    updatedAt: b.updatedAt.toISOString(),
    ...counts,
  };
}

/** Points of each run's plot on the desk (LTTB from the stored series), so a queue of many large runs stays small. */
const QUEUE_PLOT_POINTS = 100;

/** A pending run with its plot series in SI units, its part's accepted gains and the plausibility flags. */
export function presentQueueRun(
  r: CalibrationRun,
  related: { author: ReviewAuthorDto; part: Part; actuator: Actuator | undefined; buildTitle: string; acceptedGains: number[] },
): QueueRunDto {
  const { part, actuator, acceptedGains: gains } = related;
  const expected = actuator ? expectedGainForPart(part, actuator.drive, actuator.axis) : null;
  const dto = presentRun(r, QUEUE_PLOT_POINTS);
  const points = dto.points.map((p) => ({
    volts: toVolts(p.volts, r.voltageUnit),
    displacementNm: toNm(p.displacement, r.displacementUnit),
    ...(p.sweep ? { sweep: p.sweep } : {}),
  }));
  return {
    id: r.id,
    buildId: r.buildId,
    buildTitle: related.buildTitle,
    actuatorLabel: actuator?.label ?? null,
    axis: actuator?.axis ?? '',
    author: related.author,
    part: { id: part.id, name: part.name, category: part.category, stats: presentPartSummary(part).stats, acceptedGainsNmPerV: gains },
    method: r.method,
    kind: r.kind,
    fit: dto.fit,
    points,
    expectedGainNmPerV: expected?.gainNmPerV ?? null,
    flags: plausibilityFlags(
      { kind: r.kind, n: r.pointCount, gainNmPerV: r.gainNmPerV, r2: r.r2, hysteresisPctFs: r.hysteresisPctFs },
      gains,
      expected?.gainNmPerV ?? null,
    ),
    createdAt: r.createdAt.toISOString(),
  };
}

/** A proposed part on the desk. */
export function presentQueuePart(p: Part, author: ReviewAuthorDto | null): QueuePartDto {
  return {
    id: p.id,
    name: p.name,
    category: p.category,
    salvageSource: p.salvageSource,
    material: p.material,
    notes: p.notes,
    author,
    createdAt: p.createdAt.toISOString(),
  };
}

/** An open report with a label for what it points at. */
export function presentQueueReport(r: Report, reporter: ReviewAuthorDto, target: { label: string; path: string | null }): QueueReportDto {
  return {
    id: r.id,
    targetType: r.targetType,
    targetId: r.targetId,
    targetLabel: target.label,
    targetPath: target.path,
    reason: r.reason,
    note: r.note,
    reporter,
    createdAt: r.createdAt.toISOString(),
  };
}
