import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { acceptRejectInput, type QueueRunDto } from '@shared/schemas/review.ts';
import { runMethodLabels, type RunMethod } from '@shared/schemas/run-vocabulary.ts';
import { paths } from '@/config/paths.ts';
import { useDecideRun } from '@/features/review/api/decide-run.ts';
import { DecisionForm } from '../decision/decision-form.tsx';
import { age } from '../format.ts';
import { acceptChoices, RUN_NOTE_HINT } from './decision-choices.ts';
import { FitTable } from './fit-table.tsx';
import { FlagList } from './flag-list.tsx';
import { PanelFrame, PanelSection } from './panel-frame.tsx';
import { PartGains } from './part-gains.tsx';
import { RawPoints } from './run-points-table.tsx';
import { latticeRunLines } from '@shared/format/lattice-run-lines.ts';

const CalibrationChart = lazy(() => import('@/components/charts/calibration-chart.tsx').then((m) => ({ default: m.CalibrationChart })));

/** A pending calibration run: the plot, the fit, the flags and the part's accepted gains, then accept / reject. */
export function RunPanel({ run, onDecided }: { run: QueueRunDto; onDecided: (decision: string) => void }) {
  const decide = useDecideRun();
  const method = runMethodLabels[run.method as RunMethod] ?? run.method;
  return (
    <PanelFrame
      eyebrow="Calibration run pending"
      title={run.part.name}
      meta={
        <>
          {run.actuatorLabel ?? `${run.axis} axis`} in{' '}
          <Link className="text-copper underline" to={paths.build(run.buildId)}>
            {run.buildTitle}
          </Link>{' '}
          · by {run.author.login} · {method} · {age(run.createdAt)} waiting
        </>
      }
      decision={
        <DecisionForm
          id={`run-${run.id}`}
          schema={acceptRejectInput}
          choices={acceptChoices}
          noteLabel="Note to the maker"
          noteHint={RUN_NOTE_HINT}
          onDecide={async (v) => {
            await decide.mutateAsync({ id: run.id, ...v });
            onDecided(v.decision);
          }}
        />
      }
    >
      <PanelSection title="Flags">
        <FlagList flags={run.flags} />
      </PanelSection>
      <PanelSection title={run.kind === 'sine-record' ? 'Loop (decimated)' : run.kind === 'lattice' ? 'Lattice image' : 'Calibration plot'}>
        {run.kind === 'peak-to-peak' ? (
          <p className="text-sm text-ink-soft">
            A peak-to-peak reading: two readings under a sine drive make one gain, with nothing to plot.
          </p>
        ) : run.kind === 'lattice' && run.fit.lattice ? (
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            {latticeRunLines(run.fit.lattice).map(([k, v]) => (
              <div key={k} className="contents">
                <dt className="text-ink-soft">{k}</dt>
                <dd className="num">{v}</dd>
              </div>
            ))}
          </dl>
        ) : (
          <div className="rounded-md border border-rule bg-white p-2 sm:p-3">
            <Suspense
              fallback={
                <p role="status" className="flex h-[260px] items-center justify-center text-sm text-ink-soft">
                  Loading the plot…
                </p>
              }
            >
              <CalibrationChart
                points={run.points}
                fit={{ interceptNm: run.fit.interceptNm, gainNmPerV: run.fit.gainNmPerV }}
                height={260}
              />
            </Suspense>
          </div>
        )}
      </PanelSection>
      <PanelSection title="Fit">
        <FitTable fit={run.fit} />
      </PanelSection>
      <PanelSection title="Raw points">
        <RawPoints runId={run.id} />
      </PanelSection>
      <PanelSection title="Accepted gains of this part">
        <PartGains run={run} />
      </PanelSection>
    </PanelFrame>
  );
}
