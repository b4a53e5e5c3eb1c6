import { z } from 'zod';
import { pointsRunInput, type PointsRunInput, type RunDto } from '@shared/schemas/run.ts';
import type { RecordedCalibrationPoint } from '@shared/workbench/calibration-fit.ts';
import { parseNumber, parseOptionalNumber } from '@/lib/csv/number-text.ts';

/** One row of the points grid as typed (text, so half-typed numbers survive). */
export interface GridPoint {
  volts: string;
  displacement: string;
  sweep: '' | 'up' | 'down';
}

const gridPoint = z.object({ volts: z.string(), displacement: z.string(), sweep: z.enum(['', 'up', 'down']) });

const formShape = z.object({
  method: z.string(),
  voltageUnit: z.string(),
  displacementUnit: z.string(),
  model: z.string(),
  drive: z.object({ kind: z.enum(['dc-steps', 'sine']), frequencyHz: z.string(), amplitudeV: z.string() }),
  conditions: z.object({ preload: z.string(), temperatureC: z.string(), notes: z.string() }),
  notes: z.string(),
  measuredOn: z.string(),
  points: z.array(gridPoint),
});
export type RunFormValues = z.input<typeof formShape>;

export const blankPoint = (): GridPoint => ({ volts: '', displacement: '', sweep: '' });
const isBlank = (p: GridPoint) => !p.volts.trim() && !p.displacement.trim();
const text = (s: string) => s.trim() || undefined;

export const runFormDefaults = (): RunFormValues => ({
  method: '',
  voltageUnit: 'V',
  displacementUnit: 'nm',
  model: 'intercept',
  drive: { kind: 'dc-steps', frequencyHz: '', amplitudeV: '' },
  conditions: { preload: '', temperatureC: '', notes: '' },
  notes: '',
  measuredOn: '',
  points: Array.from({ length: 5 }, blankPoint),
});

const cell = (n: number) => String(n);

/** A stored point run (every point, not a decimated series) as the form's values, for correcting it. */
export const runFormValuesOf = (run: RunDto): RunFormValues => ({
  method: run.method,
  voltageUnit: run.voltageUnit,
  displacementUnit: run.displacementUnit,
  model: run.model,
  drive:
    run.drive?.kind === 'sine'
      ? { kind: 'sine', frequencyHz: cell(run.drive.frequencyHz), amplitudeV: cell(run.drive.amplitudeV) }
      : { kind: 'dc-steps', frequencyHz: '', amplitudeV: '' },
  conditions: {
    preload: run.conditions?.preload ?? '',
    temperatureC: run.conditions?.temperatureC === undefined ? '' : cell(run.conditions.temperatureC),
    notes: run.conditions?.notes ?? '',
  },
  notes: run.notes ?? '',
  measuredOn: run.measuredOn ?? '',
  points: run.points.map((p) => ({ volts: cell(p.volts), displacement: cell(p.displacement), sweep: p.sweep ?? '' })),
});

/**
 * The grid's text turned into the API's run: blank rows dropped, numbers parsed (a row that is not a
 * number is flagged where it stands), then checked by the shared `pointsRunInput` itself.
 */
export const runForm = formShape
  .transform((v, ctx): z.input<typeof pointsRunInput> => {
    const points: z.input<typeof pointsRunInput>['points'] = [];
    v.points.forEach((p, i) => {
      if (isBlank(p)) return;
      const volts = parseNumber(p.volts);
      const displacement = parseNumber(p.displacement);
      if (!Number.isFinite(volts)) ctx.addIssue({ code: 'custom', path: ['points', i, 'volts'], message: 'Not a number.' });
      if (!Number.isFinite(displacement)) ctx.addIssue({ code: 'custom', path: ['points', i, 'displacement'], message: 'Not a number.' });
      points.push({ volts, displacement, ...(p.sweep ? { sweep: p.sweep } : {}) });
    });
    const temperatureC = parseOptionalNumber(v.conditions.temperatureC);
    if (Number.isNaN(temperatureC)) ctx.addIssue({ code: 'custom', path: ['conditions', 'temperatureC'], message: 'Not a number.' });
    const sine = v.drive.kind === 'sine';
    const conditions = { preload: text(v.conditions.preload), temperatureC, notes: text(v.conditions.notes) };
    return {
      method: v.method as PointsRunInput['method'],
      voltageUnit: v.voltageUnit as PointsRunInput['voltageUnit'],
      displacementUnit: v.displacementUnit as PointsRunInput['displacementUnit'],
      model: v.model as PointsRunInput['model'],
      drive: sine
        ? { kind: 'sine', frequencyHz: parseNumber(v.drive.frequencyHz), amplitudeV: parseNumber(v.drive.amplitudeV) }
        : { kind: 'dc-steps' },
      conditions: Object.values(conditions).some((c) => c !== undefined) ? conditions : undefined,
      notes: text(v.notes),
      ...(v.measuredOn ? { measuredOn: v.measuredOn } : {}),
      points,
    };
  })
  .pipe(pointsRunInput);

/** The points the live preview can use (readable rows only), and how many typed rows it had to leave out. */
export function previewPoints(rows: readonly GridPoint[]): { points: RecordedCalibrationPoint[]; skipped: number } {
  const points: RecordedCalibrationPoint[] = [];
  let skipped = 0;
  for (const p of rows) {
    if (isBlank(p)) continue;
    const volts = parseNumber(p.volts);
    const displacement = parseNumber(p.displacement);
    if (Number.isFinite(volts) && Number.isFinite(displacement))
      points.push({ volts, displacement, ...(p.sweep ? { sweep: p.sweep } : {}) });
    else skipped++;
  }
  return { points, skipped };
}
