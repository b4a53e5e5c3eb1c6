import type { RawFitRow } from '@/lib/csv/points-csv.ts';
import type { RowProblem } from '@/lib/csv/split-csv.ts';

const SHOWN_ROWS = 50;

/** The first rows of a pasted or loaded CSV as they were read, each marked used or left out. */
export function RowsPreview({
  rows,
  problems,
  voltsUnit,
  lengthUnit,
}: {
  rows: readonly RawFitRow[];
  problems: readonly RowProblem[];
  voltsUnit: string;
  lengthUnit: string;
}) {
  if (rows.length === 0) return null;
  const bad = new Map(problems.map((p) => [p.line, p.message]));
  return (
    <div className="overflow-x-auto rounded-md border border-rule">
      <table className="w-full min-w-[24rem] text-left text-sm">
        <caption className="px-2 py-1 text-left text-xs text-ink-soft">
          Preview: {rows.length > SHOWN_ROWS ? `first ${SHOWN_ROWS} of ${rows.length} rows` : `${rows.length} rows`} as read
        </caption>
        <thead className="bg-paper text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-1 font-medium">
              Line
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Volts ({voltsUnit})
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Displacement ({lengthUnit})
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Sweep
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Status
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {rows.slice(0, SHOWN_ROWS).map((r) => (
            <tr key={r.line} className={bad.has(r.line) ? 'bg-danger/5' : undefined}>
              <td className="num px-2 py-0.5 text-ink-soft">{r.line}</td>
              <td className="num px-2 py-0.5">{r.volts}</td>
              <td className="num px-2 py-0.5">{r.displacement}</td>
              <td className="px-2 py-0.5">{r.sweep || '—'}</td>
              <td className={`px-2 py-0.5 ${bad.has(r.line) ? 'text-danger' : 'text-teal-dark'}`}>
                {bad.has(r.line) ? 'left out' : 'used'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
