import { type UpdateRunInput } from '@shared/schemas/run.ts';
import { runKindLabels, type RunKind } from '@shared/schemas/run-vocabulary.ts';
import { ValidationError } from '../errors.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';
import type { RunDetail } from '../presenters/run.presenter.ts';

const parse = (json: string | null): unknown => (json ? JSON.parse(json) : undefined);

/** Drops the keys whose value is null or undefined (a null in a change means "clear this field"). */
function present(o: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== null && v !== undefined));
}

/**
 * A stored run as the create input it came from, with a change merged over it: the input the server
 * validates and refits when a run is corrected. Fields of another kind in the change are kept so the
 * schema refuses them by name.
 */
export function storedRunInput(r: CalibrationRun, change: UpdateRunInput): unknown {
  const detail = (parse(r.detailJson) ?? {}) as RunDetail;
  const common = {
    kind: r.kind,
    method: r.method,
    voltageUnit: r.voltageUnit,
    displacementUnit: r.displacementUnit,
    drive: parse(r.driveJson),
    conditions: parse(r.conditionsJson),
    notes: r.notes,
    measuredOn: r.measuredOn,
  };
  const own =
    r.kind === 'lattice'
      ? (JSON.parse(r.pointsJson) as Record<string, unknown>)
      : r.kind === 'points'
        ? { model: r.model, points: JSON.parse(r.pointsJson) as unknown }
        : r.kind === 'sine-record'
          ? { samples: JSON.parse(r.pointsJson) as unknown, frequencyHz: detail.sine?.frequencyKnown ? detail.sine.frequencyHz : undefined }
          : {
              displacementPp: detail.reading?.displacementPp,
              voltsPp: detail.reading?.voltsPp,
              displacementResolution: detail.reading?.displacementResolution,
              voltsResolution: detail.reading?.voltsResolution,
              frequencyHz: detail.reading?.frequencyHz,
            };
  return present({ ...common, ...own, ...(change as Record<string, unknown>) });
}

/** The fields of a change that only another kind of run has. */
const OTHER_KIND_FIELDS: Record<RunKind, readonly string[]> = {
  points: ['displacementPp', 'voltsPp', 'displacementResolution', 'voltsResolution', 'frequencyHz', 'samples'],
  'peak-to-peak': ['points', 'model', 'samples'],
  'sine-record': ['points', 'model', 'displacementPp', 'voltsPp', 'displacementResolution', 'voltsResolution'],
  lattice: ['points', 'model', 'samples', 'displacementPp', 'voltsPp', 'displacementResolution', 'voltsResolution', 'frequencyHz'],
};

/** Refuse a change that names fields this kind of run does not have (400 naming the field). */
export function assertChangeFitsKind(kind: RunKind, change: UpdateRunInput): void {
  const wrong = OTHER_KIND_FIELDS[kind].filter((k) => (change as Record<string, unknown>)[k] !== undefined);
  if (wrong.length > 0)
    throw new ValidationError(
      `${wrong[0]}: a ${runKindLabels[kind].toLowerCase()} run has no ${wrong.join(', ')}.`,
      wrong.map((path) => ({ path, message: `Not a field of a ${runKindLabels[kind].toLowerCase()} run.`, code: 'wrong_kind' })),
    );
}
