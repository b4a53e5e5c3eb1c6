import { formatDate } from '@shared/format/dates.ts';
import { Link } from 'react-router-dom';
import type { PartRunDto } from '@shared/schemas/part.ts';
import { runKindLabels, runMethodLabels, type RunMethod } from '@shared/schemas/run-vocabulary.ts';
import { runGainPlusMinus } from '@shared/export/run-figures.ts';
import { paths } from '@/config/paths.ts';
import { formatShort, formatWithUncertainty } from '@shared/format/measured-number.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

function Gain({ run }: { run: PartRunDto }) {
  const pm = runGainPlusMinus(run);
  if (pm.halfWidth === null) return <>{formatShort(run.gainNmPerV)}</>;
  const f = formatWithUncertainty(run.gainNmPerV, pm.halfWidth);
  return (
    <>
      {f.value}
      {f.uncertainty && (
        <span className="text-ink-soft">
          {' '}
          ± {f.uncertainty} <PlusMinusLabel kind={pm.kind} />
        </span>
      )}
    </>
  );
}

/** The accepted runs behind the figures, each linking to the build it was measured in. */
export function PartRunsTable({ runs }: { runs: PartRunDto[] }) {
  if (runs.length === 0) return null;
  return (
    <section aria-labelledby="part-runs-title">
      <h2 id="part-runs-title" className="mb-2 text-lg font-semibold">
        Accepted runs
      </h2>
      <div
        className="overflow-x-auto rounded-lg border border-rule bg-white"
        tabIndex={0}
        role="region"
        aria-label="Accepted runs, scrolls sideways on narrow screens"
      >
        <table className="w-full min-w-[42rem] border-collapse text-sm">
          <thead className="bg-paper-deep/60 text-left text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">
                Build and actuator
              </th>
              <th scope="col" className="px-3 py-2">
                Maker
              </th>
              <th scope="col" className="px-3 py-2">
                Method
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Gain (nm/V)
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Hysteresis
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Date
              </th>
            </tr>
          </thead>
          <tbody>
            {runs.map((r) => (
              <tr key={r.id} className="border-t border-rule">
                <td className="min-w-44 px-3 py-1.5">
                  <Link to={paths.build(r.buildId)} className="text-copper-dark underline decoration-copper/40 underline-offset-2">
                    {r.buildTitle || `Build ${r.buildId}`}
                  </Link>
                  <span className="block text-xs text-ink-soft">
                    {r.actuator.label ? `${r.actuator.label} · ` : ''}
                    {r.actuator.axis ? `${r.actuator.axis} axis` : ''}
                  </span>
                </td>
                <td className="whitespace-nowrap px-3 py-1.5">{r.maker}</td>
                <td className="px-3 py-1.5">
                  {runMethodLabels[r.method as RunMethod] ?? r.method}
                  <span className="block text-xs text-ink-soft">{runKindLabels[r.kind]}</span>
                </td>
                <td className="num whitespace-nowrap px-3 py-1.5 text-right">
                  <Gain run={r} />
                </td>
                <td className="num whitespace-nowrap px-3 py-1.5 text-right">
                  {r.hysteresisPctFs === null ? '—' : `${formatShort(r.hysteresisPctFs, 2)} %`}
                </td>
                <td className="num whitespace-nowrap px-3 py-1.5 text-right">{formatDate(r.createdAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
