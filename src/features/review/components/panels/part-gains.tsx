import { lazy, Suspense } from 'react';
import type { QueueRunDto } from '@shared/schemas/review.ts';
import { summarize } from '@shared/stats/quantiles.ts';
import { sig } from '../format.ts';

const GainDistributionChart = lazy(() =>
  import('@/components/charts/gain-distribution-chart.tsx').then((m) => ({ default: m.GainDistributionChart })),
);

/** Where the run's gain sits among the part's quartiles, in words. */
function placeOf(gain: number, p25: number | null, p75: number | null): string {
  if (p25 === null || p75 === null) return '';
  if (gain < p25) return 'below the lower quartile';
  if (gain > p75) return 'above the upper quartile';
  return 'between the quartiles';
}

/** The part's accepted gains as a strip and box plot with this run marked, and the same figures (type-7 quartiles) in words. */
export function PartGains({ run }: { run: QueueRunDto }) {
  const gains = run.part.acceptedGainsNmPerV;
  const s = summarize(gains);
  const gain = Math.abs(run.fit.gainNmPerV);
  const place = placeOf(gain, s.p25, s.p75);
  return (
    <figure className="rounded-md border border-rule bg-white p-2 sm:p-3">
      <Suspense
        fallback={
          <p role="status" className="flex h-[150px] items-center justify-center text-sm text-ink-soft">
            Loading the plot…
          </p>
        }
      >
        <GainDistributionChart gains={gains} candidateNmPerV={gain} expectedNmPerV={run.expectedGainNmPerV} />
      </Suspense>
      <figcaption className="mt-2 space-y-0.5 text-sm">
        {gains.length === 0 ? (
          <p>No accepted runs of {run.part.name} yet: this would be the first.</p>
        ) : (
          <p>
            <span className="num">{gains.length}</span> accepted {gains.length === 1 ? 'run' : 'runs'} of {run.part.name}: median{' '}
            <span className="num">{sig(s.median)}</span> nm/V, quartiles <span className="num">{sig(s.p25)}</span>–
            <span className="num">{sig(s.p75)}</span> nm/V, range <span className="num">{sig(s.min)}</span>–
            <span className="num">{sig(s.max)}</span> nm/V.
          </p>
        )}
        <p>
          This run: <span className="num font-medium">{sig(gain, 4)}</span> nm/V{place && <>, {place}</>}.
          {run.expectedGainNmPerV !== null && (
            <>
              {' '}
              Expected from geometry: <span className="num">{sig(run.expectedGainNmPerV)}</span> nm/V (measured ÷ expected{' '}
              <span className="num">{sig(gain / run.expectedGainNmPerV, 2)}</span>).
            </>
          )}
        </p>
      </figcaption>
    </figure>
  );
}
