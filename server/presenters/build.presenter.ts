import type { BuildDto, BuildGainDto, BuildOwnerDto, BuildSummaryDto, LogEntryDto, PhotoDto } from '@shared/schemas/build.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { expectedGainForPart } from '@shared/workbench/part-expected-gain.ts';
import type { Build } from '../models/build.model.ts';
import type { LogEntry } from '../models/log-entry.model.ts';
import type { Actuator } from '../models/actuator.model.ts';
import type { Part } from '../models/part.model.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';
import { presentPartSummary } from './part.presenter.ts';
import { presentRun } from './run.presenter.ts';
import { presentDriveMatrix } from './drive-matrix.presenter.ts';
import { presentLinearisation } from './linearisation.presenter.ts';

/** What a build card shows beside the build's own columns, loaded in batches by the read service. */
export interface BuildCardExtras {
  owner: BuildOwnerDto;
  cover: PhotoDto | null;
  gains: BuildGainDto[];
}

/** The run a card shows for an actuator: its newest accepted run, else its newest run (runs newest first). */
export function headlineRun<R extends Pick<CalibrationRun, 'status'>>(runs: R[]): R | undefined {
  return runs.find((r) => r.status === 'accepted') ?? runs[0];
}

/** One measured gain per actuator with a run (runs newest first, rejected ones left out). */
export function presentGains(
  actuators: Array<Pick<Actuator, 'id' | 'axis'> & { part?: Pick<Part, 'name'> | null }>,
  runs: Array<Pick<CalibrationRun, 'actuatorId' | 'status' | 'gainNmPerV'>>,
): BuildGainDto[] {
  const gains: BuildGainDto[] = [];
  for (const a of actuators) {
    const run = headlineRun(runs.filter((r) => r.actuatorId === a.id && r.status !== 'rejected'));
    if (run)
      gains.push({ actuatorId: a.id, axis: a.axis, partName: a.part?.name ?? '', gainNmPerV: run.gainNmPerV, runStatus: run.status });
  }
  return gains;
}

/** The cover a card shows: the chosen photo, else the first (photos in display order). */
export function coverOf(build: Pick<Build, 'coverPhotoId'>, photos: PhotoDto[]): PhotoDto | null {
  return photos.find((p) => p.id === build.coverPhotoId) ?? photos[0] ?? null;
}

/**
 * A build card: a field allow-list over the build row and its batched extras. The review note goes only to
 * viewers who may read it (`seesReviewNote`: owner, moderators) unless the moderator made it public.
 */
export function presentBuildSummary(b: Build, extras: BuildCardExtras, seesReviewNote: boolean): BuildSummaryDto {
  return {
    id: b.id,
    title: b.title,
    instrumentKind: b.instrumentKind,
    summary: b.summary,
    stage: b.stage,
    status: b.status,
    owner: extras.owner,
    cover: extras.cover,
    gains: extras.gains,
    editedSinceReview: b.editedSinceReview,
    reviewNote: seesReviewNote || b.reviewNotePublic ? b.reviewNote : null,
    reviewNotePublic: b.reviewNotePublic,
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
    publishedAt: b.publishedAt?.toISOString() ?? null,
  };
}

/**
 * Plot points per run on a build page: a budget of 4 000 shared by all its runs (at most 2 000 each,
 * at least 40), so the page stays a few hundred kilobytes whatever its runs hold.
 */
export function buildPagePlotPoints(runCount: number): number {
  return Math.max(40, Math.min(2000, Math.floor(4000 / Math.max(1, runCount))));
}

/** An actuator with its part, runs (newest first) and expected gain. */
export function presentActuator(a: Actuator, part: Part, runs: CalibrationRun[]): ActuatorDto {
  const expected = expectedGainForPart(part, a.drive, a.axis);
  return {
    id: a.id,
    buildId: a.buildId,
    label: a.label,
    axis: a.axis,
    drive: a.drive,
    amplifier: a.amplifier,
    maxVolts: a.maxVolts,
    notes: a.notes,
    part: presentPartSummary(part),
    expectedGain: expected
      ? { gainNmPerV: expected.gainNmPerV, lowNmPerV: expected.lowNmPerV, highNmPerV: expected.highNmPerV, basis: expected.basis }
      : null,
    driveMatrix: presentDriveMatrix(a.driveMatrixJson),
    linearisation: presentLinearisation(a.linearisationJson),
    runs: runs.filter((r) => r.actuatorId === a.id).map((r) => presentRun(r, buildPagePlotPoints(runs.length))),
  };
}

/** Log entries in order, each with its photos. */
export function presentEntries(entries: LogEntry[], photos: PhotoDto[]): LogEntryDto[] {
  return entries.map((e) => ({
    id: e.id,
    entryDate: e.entryDate,
    title: e.title,
    body: e.body,
    photos: photos.filter((p) => p.entryId === e.id),
  }));
}

/** The actor-independent content of a build page, as the read service loads (and caches) it. */
export interface BuildPageContent {
  extras: BuildCardExtras;
  photos: PhotoDto[];
  entries: LogEntryDto[];
  actuators: ActuatorDto[];
}

/** The whole build page; `mayEdit` is the caller's authorization answer for this actor. */
export function presentBuildPage(b: Build, content: BuildPageContent, mayEdit: boolean, seesReviewNote: boolean): BuildDto {
  const editable = b.status === 'draft' || b.status === 'returned' || b.status === 'published';
  return {
    ...presentBuildSummary(b, content.extras, seesReviewNote),
    body: b.body,
    photos: content.photos,
    entries: content.entries,
    actuators: content.actuators,
    abilities: {
      edit: mayEdit && editable,
      submit: mayEdit && (b.status === 'draft' || b.status === 'returned'),
      withdraw: mayEdit && b.status === 'submitted',
      delete: mayEdit && b.status === 'draft',
    },
  };
}
