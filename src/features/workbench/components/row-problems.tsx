import type { RowProblem } from '@/lib/csv/split-csv.ts';

const SHOWN_PROBLEMS = 20;

/** How many rows count, and a message per row left out (line number and what is wrong). */
export function RowProblems({
  used,
  problems,
  note,
  what = 'Row',
  noun = 'point',
}: {
  used: number;
  problems: readonly RowProblem[];
  note?: string | null;
  what?: string;
  noun?: string;
}) {
  return (
    <div className="space-y-1 text-sm" aria-live="polite">
      <p>
        <span className="num">{used}</span> {used === 1 ? noun : `${noun}s`} used
        {problems.length > 0 && (
          <>
            , <span className="num font-semibold text-danger">{problems.length}</span> left out
          </>
        )}
        .
      </p>
      {note && <p className="text-ink-soft">{note}</p>}
      {problems.length > 0 && (
        <ul className="list-disc space-y-0.5 pl-5 text-danger">
          {problems.slice(0, SHOWN_PROBLEMS).map((p) => (
            <li key={p.line}>
              <span className="num">
                {what} {p.line}
              </span>
              : {p.message}
            </li>
          ))}
          {problems.length > SHOWN_PROBLEMS && <li className="text-ink-soft">…and {problems.length - SHOWN_PROBLEMS} more.</li>}
        </ul>
      )}
    </div>
  );
}
