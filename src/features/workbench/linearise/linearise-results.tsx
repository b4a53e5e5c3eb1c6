import type { LineariseResult } from '@shared/workbench/linearise.ts';
import { driveTableC, driveTableCsv } from '@shared/export/drive-table.ts';
import { formatFixed, formatSig, formatWithUncertainty } from '@shared/format/measured-number.ts';
import { Button } from '@/components/ui/button.tsx';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

const BRANCH_TITLES = { up: 'Up sweep', down: 'Down sweep', all: 'All points' } as const;
const PREVIEW_ROWS = 12;

/** Saves text as a file in the browser (nothing is uploaded). */
function download(name: string, type: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.click();
  URL.revokeObjectURL(url);
}

/** Each branch's polynomial, the nonlinearity before and after, and the drive table with its downloads. */
export function LineariseResults({ r }: { r: LineariseResult }) {
  const branches = Object.entries(r.branches) as Array<[keyof typeof BRANCH_TITLES, NonNullable<LineariseResult['branches']['up']>]>;
  const cols = (['volts', 'voltsUp', 'voltsDown'] as const).filter((k) => r.table.some((row) => row[k] !== undefined));
  return (
    <div className="space-y-4">
      <section aria-label="Results" className="rounded-lg border border-rule bg-white p-4">
        <p className="text-sm uppercase tracking-wide text-ink-soft">Results</p>
        <p className="mt-1 text-sm">
          Nonlinearity on a straight line: <span className="num font-semibold">{formatFixed(r.nonlinearityPctBefore, 2)} %</span> of span;
          left after driving through the table:{' '}
          <span className="num font-semibold">{formatFixed(r.residualNonlinearityPctAfter, 2)} %</span> of span (largest residual ÷ span of{' '}
          <span className="num">{formatSig(r.spanNm)} nm</span>).
        </p>
        {branches.map(([name, b]) => (
          <div key={name} className="mt-3 border-t border-rule pt-3">
            <h3 className="text-sm font-semibold">
              {BRANCH_TITLES[name]} · degree {b.degree} · {b.n} points · R² {formatFixed(b.r2, 6)} · residual SD{' '}
              <span className="num">{formatSig(b.residualStdNm, 2)} nm</span>
            </h3>
            <ul className="num mt-1 space-y-0.5 text-sm">
              {b.coefficients.map((c, k) => {
                const f = formatWithUncertainty(c, b.coefficientStdErr[k]);
                return (
                  <li key={k}>
                    c{k} = {f.value}
                    {f.uncertainty && (
                      <>
                        {' '}
                        ± {f.uncertainty} <PlusMinusLabel kind="std" className="text-xs" />
                      </>
                    )}{' '}
                    <span className="font-sans text-ink-soft">{k === 0 ? 'nm' : `nm/V${k === 1 ? '' : ['²', '³', '⁴', '⁵'][k - 2]}`}</span>
                  </li>
                );
              })}
            </ul>
          </div>
        ))}
        <p className="mt-3 text-xs text-ink-soft">
          <strong>Basis:</strong> least-squares polynomial per sweep branch, centred and scaled voltages solved by Householder QR (Source:
          Golub &amp; Van Loan, Matrix Computations); &ldquo;auto&rdquo; adds a degree while the partial F-test at 5 % says it helps
          (Source: Draper &amp; Smith, Applied Regression Analysis). Each branch must rise or fall steadily over the driven range to be
          inverted.
        </p>
      </section>
      <section aria-label="Drive table" className="rounded-lg border border-rule bg-white p-4">
        <h3 className="text-sm font-semibold">Drive table · {r.table.length} rows</h3>
        <div className="mt-2 overflow-x-auto">
          <table className="num w-full text-sm">
            <thead className="text-left text-xs text-ink-soft">
              <tr>
                <th scope="col" className="py-1 pr-3 font-normal">
                  Target (nm)
                </th>
                {cols.map((k) => (
                  <th key={k} scope="col" className="py-1 pr-3 font-normal">
                    {k === 'volts' ? 'Volts' : k === 'voltsUp' ? 'Volts, going up' : 'Volts, coming down'}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {r.table.slice(0, PREVIEW_ROWS).map((row) => (
                <tr key={row.targetNm} className="border-t border-rule">
                  <td className="py-0.5 pr-3">{formatSig(row.targetNm, 5)}</td>
                  {cols.map((k) => (
                    <td key={k} className="py-0.5 pr-3">
                      {formatSig(row[k], 5)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          {r.table.length > PREVIEW_ROWS && (
            <p className="mt-1 text-xs text-ink-soft">… and {r.table.length - PREVIEW_ROWS} more rows in the files.</p>
          )}
        </div>
        <div className="mt-3 flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => download('drive-table.csv', 'text/csv', driveTableCsv(r.table))}>
            Download CSV
          </Button>
          <Button variant="secondary" onClick={() => download('drive_table.h', 'text/x-c', driveTableC(r.table))}>
            Download as a C array
          </Button>
        </div>
      </section>
    </div>
  );
}
