import { lazy, Suspense, useState } from 'react';
import { acceptRejectInput, type QueueRunDto } from '@shared/schemas/review.ts';
import { formatPlusMinus } from '@shared/format/measured-number.ts';
import { runGainPlusMinus, runPrintedFigures } from '@shared/export/run-figures.ts';
import { useDecideRun } from '@/features/review/api/decide-run.ts';
import { DecisionForm } from '../decision/decision-form.tsx';
import { FlagChips } from '../flag-chips.tsx';
import { acceptChoices, decidedWords, RUN_NOTE_HINT } from './decision-choices.ts';
import { RawPoints } from './run-points-table.tsx';

const CalibrationChart = lazy(() => import('@/components/charts/calibration-chart.tsx').then((m) => ({ default: m.CalibrationChart })));

/** The build's pending runs, each with its gain and ±, flags, a small plot, its raw points and its own decision. */
export function BuildRuns({ runs }: { runs: QueueRunDto[] }) {
  // A decided run leaves the list when the desk reloads; the line above the list says what happened to it.
  const [message, setMessage] = useState('');
  return (
    <div className="space-y-3">
      <p role="status" className={message ? 'rounded-md border border-teal/40 bg-teal/5 px-3 py-2 text-sm' : 'sr-only'}>
        {message}
      </p>
      {runs.length === 0 ? (
        <p className="text-sm text-ink-soft">No run in this build is pending review.</p>
      ) : (
        <ul className="space-y-3">
          {runs.map((r) => (
            <BuildRun key={r.id} run={r} onDecided={(decision, title) => setMessage(`${decidedWords[decision]}: run ${r.id}, ${title}.`)} />
          ))}
        </ul>
      )}
    </div>
  );
}

function BuildRun({ run, onDecided }: { run: QueueRunDto; onDecided: (decision: string, title: string) => void }) {
  const decide = useDecideRun();
  const pm = runGainPlusMinus(run.fit);
  const figures = runPrintedFigures(run);
  const plottable = run.kind === 'points' || run.kind === 'sine-record';
  const title = `${run.actuatorLabel ?? `${run.axis} axis`} · ${run.part.name}`;
  return (
    <li className="rounded-md border border-rule p-3" aria-label={`Run ${run.id}: ${title}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
        <h4 className="font-medium">{title}</h4>
        <p className="num text-sm">
          <span className="sr-only">Gain </span>
          {formatPlusMinus(run.fit.gainNmPerV, pm.halfWidth, pm.kind)}
        </p>
      </div>
      <p className="text-xs text-ink-soft">
        {run.kind} · {run.fit.n} {run.kind === 'sine-record' ? 'samples' : 'points'} · R² {figures.r2} · hysteresis {figures.hysteresisPct}{' '}
        % of span
      </p>
      <div className="mt-2">{run.flags.length ? <FlagChips flags={run.flags} /> : <p className="text-sm text-ink-soft">No flags.</p>}</div>
      {plottable && (
        <div className="mt-2 rounded border border-rule bg-white p-1">
          <Suspense
            fallback={
              <p role="status" className="flex h-[140px] items-center justify-center text-sm text-ink-soft">
                Loading the plot…
              </p>
            }
          >
            <CalibrationChart points={run.points} fit={{ interceptNm: run.fit.interceptNm, gainNmPerV: run.fit.gainNmPerV }} height={220} />
          </Suspense>
        </div>
      )}
      <div className="mt-2">
        <RawPoints runId={run.id} />
      </div>
      <div className="mt-2">
        <DecisionForm
          id={`build-run-${run.id}`}
          schema={acceptRejectInput}
          choices={acceptChoices}
          noteLabel="Note on this run"
          noteHint={RUN_NOTE_HINT}
          noteRows={1}
          label={`Decision on ${title}`}
          onDecide={async (v) => {
            await decide.mutateAsync({ id: run.id, ...v });
            onDecided(v.decision, title);
          }}
        />
      </div>
    </li>
  );
}
