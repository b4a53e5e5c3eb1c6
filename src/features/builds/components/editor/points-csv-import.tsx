import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';
import { parsePointsCsv, type ParsedPointsCsv } from './parse-points-csv.ts';
import type { GridPoint } from './run-form-schema.ts';

/** Paste or upload CSV (volts, displacement, sweep; header optional); bad rows are listed and left out. */
export function PointsCsvImport({ idPrefix, onPoints }: { idPrefix: string; onPoints: (points: GridPoint[]) => void }) {
  const [text, setText] = useState('');
  const [report, setReport] = useState<(ParsedPointsCsv & { source: string }) | null>(null);
  const id = `${idPrefix}-csv`;

  const use = (csv: string, source: string) => {
    const parsed = parsePointsCsv(csv);
    setReport({ ...parsed, source });
    if (parsed.points.length > 0) onPoints(parsed.points);
  };

  return (
    <details className="rounded-md border border-rule bg-paper/60 p-3">
      <summary className="cursor-pointer text-sm font-medium">Paste or upload CSV</summary>
      <p className="mt-2 text-xs text-ink-soft">
        Columns: volts, displacement, sweep (up, down or empty), in the units chosen above. A header row is optional. The imported points
        replace the grid.
      </p>
      <label htmlFor={id} className="mb-1 mt-2 block text-sm font-medium">
        CSV text
      </label>
      <textarea
        id={id}
        rows={5}
        className={`${inputClass} num text-sm`}
        value={text}
        placeholder={'volts,displacement,sweep\n0,0,up\n10,95,up'}
        onChange={(e) => setText(e.target.value)}
      />
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <Button variant="secondary" disabled={!text.trim()} onClick={() => use(text, 'pasted CSV')}>
          Use pasted points
        </Button>
        <label
          className={
            'cursor-pointer rounded-md border border-teal bg-white px-3 py-1.5 text-sm font-medium text-teal-dark ' +
            'hover:bg-teal/10 has-[input:focus-visible]:outline-2 has-[input:focus-visible]:outline-offset-2 ' +
            'has-[input:focus-visible]:outline-copper'
          }
        >
          Upload a CSV file
          <input
            type="file"
            accept=".csv,.txt,.tsv,text/csv,text/plain"
            className="sr-only"
            onChange={async (e) => {
              const f = e.target.files?.[0];
              e.target.value = '';
              if (f) use(await f.text(), f.name);
            }}
          />
        </label>
      </div>
      {report && (
        <div role="status" className="mt-3 text-sm">
          <p>
            {report.points.length === 0
              ? `No points could be read from ${report.source}.`
              : `${report.points.length} points from ${report.source} are now in the grid.`}
            {report.hadHeader && ' The first row was read as a header.'}
          </p>
          {report.bad.length > 0 && (
            <div className="mt-2 rounded-md border border-amber bg-amber/10 p-2">
              <p className="font-medium">{report.bad.length === 1 ? '1 row was left out:' : `${report.bad.length} rows were left out:`}</p>
              <ul className="mt-1 max-h-40 list-disc overflow-y-auto pl-5">
                {report.bad.slice(0, 50).map((b) => (
                  <li key={b.row}>
                    Row {b.row}: {b.reason}
                  </li>
                ))}
              </ul>
              {report.bad.length > 50 && <p className="mt-1 text-xs">…and {report.bad.length - 50} more.</p>}
            </div>
          )}
        </div>
      )}
    </details>
  );
}
