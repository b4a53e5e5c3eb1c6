import { lazy, Suspense } from 'react';
import type { PartDetailDto } from '@shared/schemas/part.ts';
import { runMethodLabels, type RunMethod } from '@shared/schemas/run-vocabulary.ts';
import { formatShort } from '@shared/format/measured-number.ts';

const PartRunsChart = lazy(() => import('@/components/charts/part-runs-chart.tsx').then((m) => ({ default: m.PartRunsChart })));

const methodLabel = (m: string) => runMethodLabels[m as RunMethod] ?? m;

/** The strip plot of every accepted run (lazily loaded, with its legend), and the same story in one sentence. */
export function PartRunsPlot({ part }: { part: PartDetailDto }) {
  const s = part.stats;
  const runs = part.runs.map((r) => ({
    id: r.id,
    gainNmPerV: r.gainNmPerV,
    buildTitle: r.buildTitle,
    maker: r.maker,
    method: methodLabel(r.method),
  }));
  const e = part.expectedGain;
  return (
    <section aria-labelledby="part-plot-title" className="rounded-lg border border-rule bg-white p-3 sm:p-4">
      <h2 id="part-plot-title" className="text-lg font-semibold">
        Every accepted run
      </h2>
      {runs.length === 0 ? (
        <p className="mt-2 text-sm text-ink-soft">
          No accepted calibration runs yet. Figures appear here once a moderator accepts the first run.
        </p>
      ) : (
        <>
          <p className="mt-1 text-sm text-ink-soft">
            <span className="num">{runs.length}</span> run{runs.length === 1 ? '' : 's'}, median{' '}
            <span className="num text-ink">{formatShort(s.gainMedianNmPerV)} nm/V</span>
            {e && (
              <>
                ; expected from geometry <span className="num text-ink">{formatShort(e.gainNmPerV)} nm/V</span> (
                <span className="num">
                  {formatShort(e.lowNmPerV)}–{formatShort(e.highNmPerV)}
                </span>
                )
              </>
            )}
            . Point at a dot for its build, maker and method; the figures under the plot list every run.
          </p>
          <div className="mt-2" data-testid="part-runs-plot">
            <Suspense
              fallback={
                <p role="status" className="flex h-[170px] items-center justify-center text-sm text-ink-soft">
                  Loading the plot…
                </p>
              }
            >
              <PartRunsChart runs={runs} median={s.gainMedianNmPerV} p25={s.gainP25NmPerV} p75={s.gainP75NmPerV} expected={e} />
            </Suspense>
          </div>
        </>
      )}
    </section>
  );
}
