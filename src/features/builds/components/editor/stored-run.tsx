import { lazy, Suspense, useState } from 'react';
import type { RunDto } from '@shared/schemas/run.ts';
import { runKindLabels, runMethodLabels } from '@shared/schemas/run-vocabulary.ts';
import { displacementUnitLabels, toNm, toVolts, voltageUnitLabels } from '@shared/units.ts';
import { StatusBadge, type BadgeTone } from '@/components/ui/status-badge.tsx';
import { Button } from '@/components/ui/button.tsx';
import { useDeleteRun } from '../../api/delete-run.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { FitSummary } from './fit-summary.tsx';
import { LazyRunDetailsForm, LazyRunForm } from './lazy-forms.ts';
import { sig } from './format.ts';
import { errorMessage } from '@/components/ui/form-bits.tsx';

const CalibrationChart = lazy(async () => ({ default: (await import('@/components/charts/calibration-chart.tsx')).CalibrationChart }));
const STATUS: Record<RunDto['status'], [BadgeTone, string]> = {
  pending: ['info', 'Pending review'],
  accepted: ['success', 'Accepted'],
  rejected: ['danger', 'Rejected'],
};

/** A saved calibration run with the fit Scanwright stored, its review state and, on request, its plot. */
export function StoredRun({ run, maxVolts = null }: { run: RunDto; maxVolts?: number | null }) {
  const remove = useDeleteRun();
  const [plot, setPlot] = useState(false);
  const [editing, setEditing] = useState(false);
  const [tone, statusText] = STATUS[run.status];
  const drive =
    run.drive?.kind === 'sine'
      ? `sine, ${sig(run.drive.frequencyHz)} Hz, ${sig(run.drive.amplitudeV)} V amplitude`
      : run.drive
        ? 'DC steps'
        : null;
  const c = run.conditions;
  const conditions = [
    c?.preload && `preload ${c.preload}`,
    c?.temperatureC !== undefined && c?.temperatureC !== null && `${sig(c.temperatureC)} °C`,
    c?.notes,
  ]
    .filter(Boolean)
    .join(' · ');
  const points = run.points.map((p) => ({
    volts: toVolts(p.volts, run.voltageUnit),
    displacementNm: toNm(p.displacement, run.displacementUnit),
    sweep: p.sweep,
  }));

  return (
    <li className="rounded-md border border-rule bg-white p-2 sm:p-3" aria-label={`Calibration run of ${run.createdAt.slice(0, 10)}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm">
          <span className="num">{run.measuredOn ?? run.createdAt.slice(0, 10)}</span> · {runKindLabels[run.kind]} ·{' '}
          {runMethodLabels[run.method]}
        </p>
        <StatusBadge tone={tone}>{statusText}</StatusBadge>
      </div>
      <div className="mt-2">
        <FitSummary fit={run.fit} label="Stored fit, computed by Scanwright" />
      </div>
      <p className="mt-2 text-xs text-ink-soft">
        {run.kind === 'lattice'
          ? 'Solved from the lattice vectors of the image and its quarters'
          : `Recorded in ${voltageUnitLabels[run.voltageUnit]} and ${displacementUnitLabels[run.displacementUnit]}; `}
        {run.kind === 'lattice'
          ? ''
          : run.kind === 'points'
            ? run.model === 'origin'
              ? 'line through the origin'
              : 'line with intercept'
            : `${run.pointCount} ${run.kind === 'sine-record' ? 'samples' : 'readings'}`}
        {drive && `; ${drive}`}
        {conditions && `; ${conditions}`}
      </p>
      {run.notes && <p className="mt-1 whitespace-pre-line text-sm">{run.notes}</p>}
      {run.reviewNote && <p className="mt-2 rounded border-l-4 border-amber bg-amber/10 px-2 py-1 text-sm">Moderator: {run.reviewNote}</p>}
      {plot && (
        <Suspense fallback={<p className="mt-2 text-sm text-ink-soft">Loading the plot…</p>}>
          <div className="mt-2">
            <CalibrationChart points={points} fit={{ interceptNm: run.fit.interceptNm, gainNmPerV: run.fit.gainNmPerV }} height={240} />
          </div>
        </Suspense>
      )}
      <div className="mt-2 flex flex-wrap gap-2">
        {run.kind !== 'peak-to-peak' && run.kind !== 'lattice' && (
          <Button variant="ghost" className="border-rule" aria-expanded={plot} onClick={() => setPlot((p) => !p)}>
            {plot ? 'Hide plot' : 'Show plot'}
          </Button>
        )}
        {(run.kind !== 'points' || !run.decimated) && (
          <Button variant="ghost" className="border-rule" aria-expanded={editing} onClick={() => setEditing((e) => !e)}>
            {editing ? 'Close the correction' : 'Correct this run'}
          </Button>
        )}
        {run.status !== 'accepted' && (
          <ConfirmButton
            label="Delete run"
            question="Delete this calibration run?"
            confirmLabel="Yes, delete"
            disabled={remove.isPending}
            onConfirm={() => remove.mutate(run.id)}
          />
        )}
      </div>
      {editing && (
        <div className="mt-2">
          {run.kind === 'points' ? (
            <Suspense fallback={<p className="text-sm text-ink-soft">Opening the run form…</p>}>
              <LazyRunForm
                actuatorId={run.actuatorId}
                maxVolts={maxVolts}
                run={run}
                onSaved={() => setEditing(false)}
                onCancel={() => setEditing(false)}
              />
            </Suspense>
          ) : (
            <Suspense fallback={<p className="text-sm text-ink-soft">Opening the form…</p>}>
              <LazyRunDetailsForm run={run} onDone={() => setEditing(false)} />
            </Suspense>
          )}
        </div>
      )}
      {remove.error && (
        <p role="alert" className="mt-2 text-sm text-danger">
          {errorMessage(remove.error)}
        </p>
      )}
    </li>
  );
}
