import type { SineRecordState } from './use-sine-record.ts';

const SHOWN_ROWS = 8;

/** The first lines of the record as read, the mapped columns marked, so a wrong mapping shows at once. */
export function SinePreview({ state }: { state: SineRecordState }) {
  const { table, mapping } = state;
  if (table.lines.length === 0) return null;
  const role = (i: number) =>
    i === mapping.time ? 'time' : i === mapping.volts ? 'drive' : i === mapping.displacement ? 'displacement' : null;
  return (
    <div className="overflow-x-auto rounded-md border border-rule">
      <table className="w-full min-w-[20rem] text-left text-sm">
        <caption className="px-2 py-1 text-left text-xs text-ink-soft">
          First {Math.min(SHOWN_ROWS, table.lines.length)} of {table.lines.length} lines
          {table.hadHeader ? ' (header line recognised)' : ' (no header line)'}
        </caption>
        <thead className="bg-paper text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-1 font-medium">
              Line
            </th>
            {table.names.map((name, i) => (
              <th key={i} scope="col" className="px-2 py-1 font-medium">
                {name}
                {role(i) && <span className="block font-semibold text-teal-dark">→ {role(i)}</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {table.lines.slice(0, SHOWN_ROWS).map((l) => (
            <tr key={l.line}>
              <td className="num px-2 py-0.5 text-ink-soft">{l.line}</td>
              {table.names.map((_, i) => (
                <td key={i} className={`num px-2 py-0.5 ${role(i) ? '' : 'text-ink-soft'}`}>
                  {l.cells[i] ?? ''}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
