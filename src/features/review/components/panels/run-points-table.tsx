import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { useRunPoints } from '@/features/review/api/get-run-points.ts';

/** "Show the raw points" and, once opened, the paged table (asked for only then). */
export function RawPoints({ runId }: { runId: number }) {
  const [open, setOpen] = useState(false);
  return (
    <div>
      <Button variant="ghost" aria-expanded={open} onClick={() => setOpen((s) => !s)}>
        {open ? 'Hide the raw points' : 'Show the raw points'}
      </Button>
      {open && <RunPointsTable runId={runId} />}
    </div>
  );
}

/** A run's raw record as a paged table, numbers as recorded in the run's own units (the export's columns). */
function RunPointsTable({ runId }: { runId: number }) {
  const [page, setPage] = useState(1);
  const points = useRunPoints(runId, page);
  if (points.isPending) {
    return (
      <p role="status" className="text-sm text-ink-soft">
        Loading the points…
      </p>
    );
  }
  if (points.isError) {
    return (
      <p role="alert" className="text-sm text-danger">
        The points did not load: {points.error.message}
      </p>
    );
  }
  const { columns, rows, total, pageSize } = points.data;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (points.data.page - 1) * pageSize + 1;
  return (
    <div className="space-y-2">
      <div tabIndex={0} aria-label={`Raw points of run ${runId}`} className="max-h-72 overflow-auto rounded-md border border-rule">
        <table className="w-full text-sm">
          <caption className="sr-only">
            Raw points of run {runId}, rows {first} to {first + rows.length - 1} of {total}
          </caption>
          <thead className="sticky top-0 bg-paper-deep">
            <tr>
              <th scope="col" className="px-2 py-1 text-right font-medium">
                #
              </th>
              {columns.map((c) => (
                <th key={c} scope="col" className="px-2 py-1 text-right font-medium">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row, i) => (
              <tr key={first + i} className="border-t border-rule">
                <td className="num px-2 py-0.5 text-right text-ink-soft">{first + i}</td>
                {row.map((v, j) => (
                  <td key={columns[j] ?? j} className="num px-2 py-0.5 text-right">
                    {v === '' ? '—' : String(v)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <Button variant="secondary" disabled={page <= 1 || points.isPlaceholderData} onClick={() => setPage((p) => p - 1)}>
          Previous
        </Button>
        <span aria-live="polite">
          Page {points.data.page} of {pages} · {total} rows
        </span>
        <Button variant="secondary" disabled={page >= pages || points.isPlaceholderData} onClick={() => setPage((p) => p + 1)}>
          Next
        </Button>
      </div>
    </div>
  );
}
