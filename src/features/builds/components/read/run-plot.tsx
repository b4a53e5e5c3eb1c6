import { lazy, Suspense } from 'react';
import type { RunDto } from '@shared/schemas/run.ts';
import { displacementUnitLabels, toNm, toVolts, voltageUnitLabels } from '@shared/units.ts';
import { ErrorBoundary } from '@/components/ui/error-boundary.tsx';
import { formatDate } from '@shared/format/dates.ts';
import { DATA_LICENCE } from '@shared/data-licence.ts';
import { latticeRunLines } from '@shared/format/lattice-run-lines.ts';

const CalibrationChart = lazy(() => import('@/components/charts/calibration-chart.tsx').then((m) => ({ default: m.CalibrationChart })));

/** Where to fetch a run's raw record, and under which licence it is shared. */
function RunExportLinks({ run }: { run: RunDto }) {
  return (
    <p className="mt-1 text-xs text-ink-soft">
      Raw{' '}
      {run.kind === 'sine-record' ? 'samples' : run.kind === 'peak-to-peak' ? 'readings' : run.kind === 'lattice' ? 'vectors' : 'points'}:{' '}
      <a className="text-teal-dark underline" href={`/api/runs/${run.id}/export?format=csv`} download>
        CSV
      </a>{' '}
      ·{' '}
      <a className="text-teal-dark underline" href={`/api/runs/${run.id}/export?format=json`} download>
        JSON
      </a>
      , shared under{' '}
      <a className="underline" href={DATA_LICENCE.url} rel="license noreferrer" target="_blank">
        {DATA_LICENCE.id.replace(/-/g, ' ')}
      </a>
      .
    </p>
  );
}

/** The selected run's points (converted to V and nm) with its fitted line, in a labelled region; a peak-to-peak reading as words. */
export function RunPlot({ run, actuatorName }: { run: RunDto; actuatorName: string }) {
  if (run.kind === 'peak-to-peak' && run.reading) {
    const r = run.reading;
    const unit = displacementUnitLabels[run.displacementUnit];
    return (
      <section aria-label={`Peak-to-peak reading: ${actuatorName}`} className="rounded-md border border-rule bg-white p-3 text-sm">
        <p>
          Peak-to-peak reading of <span className="num">{formatDate(run.measuredOn ?? run.createdAt)}</span>:{' '}
          <span className="num">
            {r.displacementPp} {unit}
          </span>{' '}
          (read to {r.displacementResolution} {unit}) for{' '}
          <span className="num">
            {r.voltsPp} {voltageUnitLabels[run.voltageUnit]}
          </span>
          {r.voltsResolution !== null && ` (read to ${r.voltsResolution} ${voltageUnitLabels[run.voltageUnit]})`}
          {r.frequencyHz !== null && `, sine at ${r.frequencyHz} Hz`}. Nothing to plot: two readings make one gain.
        </p>
        <RunExportLinks run={run} />
      </section>
    );
  }
  if (run.kind === 'lattice' && run.fit.lattice) {
    return (
      <section aria-label={`Lattice image: ${actuatorName}`} className="rounded-md border border-rule bg-white p-3 text-sm">
        <p>
          Lattice of a reference sample read off a scan image on <span className="num">{formatDate(run.measuredOn ?? run.createdAt)}</span>;
          nothing to plot: the two axes come from the image’s spectrum.
        </p>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          {latticeRunLines(run.fit.lattice).map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="text-ink-soft">{k}</dt>
              <dd className="num">{v}</dd>
            </div>
          ))}
        </dl>
        <RunExportLinks run={run} />
      </section>
    );
  }
  const points = run.points.map((p) => ({
    volts: toVolts(p.volts, run.voltageUnit),
    displacementNm: toNm(p.displacement, run.displacementUnit),
    sweep: p.sweep,
  }));
  const recordedIn = `${displacementUnitLabels[run.displacementUnit]} and ${voltageUnitLabels[run.voltageUnit]}`;
  const converted = run.displacementUnit !== 'nm' || run.voltageUnit !== 'V';
  return (
    <section
      aria-label={`Calibration plot: ${actuatorName}, run of ${formatDate(run.createdAt)}`}
      className="rounded-md border border-rule bg-white p-2 sm:p-3"
    >
      <ErrorBoundary
        fallback={
          <p role="alert" className="flex h-[300px] items-center justify-center text-center text-sm text-danger">
            The plot could not be loaded. Reload the page to try again; the figures above are complete.
          </p>
        }
      >
        <Suspense
          fallback={
            <p role="status" className="flex h-[300px] items-center justify-center text-sm text-ink-soft">
              Loading the plot…
            </p>
          }
        >
          <CalibrationChart points={points} fit={{ interceptNm: run.fit.interceptNm, gainNmPerV: run.fit.gainNmPerV }} />
        </Suspense>
      </ErrorBoundary>
      <p className="mt-2 text-xs text-ink-soft">
        Run of <span className="num">{formatDate(run.measuredOn ?? run.createdAt)}</span>: <span className="num">{run.pointCount}</span>{' '}
        {run.kind === 'sine-record' ? 'samples of a sine drive' : 'points'} recorded in {recordedIn}
        {converted ? ', plotted in nm and V' : ''}
        {run.decimated ? `; ${run.points.length} of them drawn (Largest-Triangle-Three-Buckets)` : ''};{' '}
        {run.kind === 'sine-record'
          ? 'the loop of displacement against drive, with the line of the fitted gain'
          : `line fitted ${run.model === 'origin' ? 'through the origin' : 'with an intercept'}`}
        .
      </p>
      <RunExportLinks run={run} />
    </section>
  );
}
