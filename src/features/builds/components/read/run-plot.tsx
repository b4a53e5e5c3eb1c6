import { lazy, Suspense } from 'react';
import type { RunDto } from '@shared/schemas/run.ts';
import { displacementUnitLabels, toNm, toVolts, voltageUnitLabels } from '@shared/units.ts';
import { ErrorBoundary } from '@/components/ui/error-boundary.tsx';
import { formatDate } from '@shared/format/dates.ts';

const CalibrationChart = lazy(() => import('@/components/charts/calibration-chart.tsx').then((m) => ({ default: m.CalibrationChart })));

/** The selected run's points (converted to V and nm) with its fitted line, in a labelled region. */
export function RunPlot({ run, actuatorName }: { run: RunDto; actuatorName: string }) {
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
        Run of <span className="num">{formatDate(run.createdAt)}</span>: <span className="num">{run.points.length}</span> points recorded in{' '}
        {recordedIn}
        {converted ? ', plotted in nm and V' : ''}; line fitted {run.model === 'origin' ? 'through the origin' : 'with an intercept'}.
      </p>
    </section>
  );
}
