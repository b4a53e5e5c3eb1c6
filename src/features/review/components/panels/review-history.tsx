import type { ReviewHistoryDto, RunChange, TextChange } from '@shared/schemas/review-desk.ts';
import { formatDate } from '@shared/format/dates.ts';
import { actionLabel } from '../audit/audit-labels.ts';
import { decidedWords } from './decision-choices.ts';
import { PanelSection } from './panel-frame.tsx';

/** A run's status in the desk's words. */
const statusWords: Record<'pending' | 'accepted' | 'rejected', string> = {
  pending: 'pending review',
  accepted: 'accepted',
  rejected: 'rejected',
};

const runChangeWords: Record<RunChange['change'], string> = {
  added: 'added',
  removed: 'removed',
  changed: 'changed',
  same: 'unchanged',
};

/**
 * What changed since the last review (the write-up word by word, the runs by id) and the earlier decisions
 * with their notes. On a build edited since review the changes come first and are the point of the panel.
 */
export function ReviewHistory({ history, edited }: { history: ReviewHistoryDto; edited: boolean }) {
  const { lastReview, writeUp, runs, decisions } = history;
  if (!lastReview && decisions.length === 0 && !edited) return null;
  return (
    <>
      {edited && !lastReview && (
        <PanelSection title="Edited since review: what changed">
          <p className="text-sm text-ink-soft">
            Its last review was before the desk kept what moderators saw, so there is nothing to compare with: read the write-up and runs
            below.
          </p>
        </PanelSection>
      )}
      {lastReview && writeUp && runs && (
        <PanelSection title={edited ? 'Edited since review: what changed' : 'Changed since the last review'}>
          <p className="mb-2 text-sm text-ink-soft">
            Compared with what {lastReview.moderator} saw on {formatDate(lastReview.at)} (
            {(decidedWords[lastReview.decision] ?? lastReview.decision).toLowerCase()}).
          </p>
          <h4 className="text-sm font-medium">Write-up</h4>
          {writeUp.changed ? (
            <WriteUpDiff changes={writeUp.changes} />
          ) : (
            <p className="text-sm text-ink-soft">The write-up is unchanged.</p>
          )}
          <h4 className="mt-3 text-sm font-medium">Runs</h4>
          <RunDiff runs={runs} />
        </PanelSection>
      )}
      {decisions.length > 0 && (
        <PanelSection title="Earlier decisions">
          <ol className="space-y-2 text-sm">
            {decisions.map((d) => (
              <li key={d.id} className="rounded-md border border-rule px-3 py-2">
                <p>
                  <span className="text-ink-soft">{formatDate(d.createdAt)}</span> · {d.moderator}: {actionLabel(d.action)}
                  {d.targetType === 'run' && d.targetLabel ? ` ${d.targetLabel}` : ''}
                </p>
                {d.note && <blockquote className="mt-1 whitespace-pre-line border-l-4 border-amber pl-2">{d.note}</blockquote>}
              </li>
            ))}
          </ol>
        </PanelSection>
      )}
    </>
  );
}

/** The write-up with removed words struck through and added words underlined, each also named for screen readers. */
function WriteUpDiff({ changes }: { changes: TextChange[] }) {
  return (
    <div
      tabIndex={0}
      aria-label="Write-up changes"
      className="max-h-72 overflow-y-auto whitespace-pre-wrap break-words rounded-md border border-rule bg-white p-3 text-sm"
    >
      {changes.map((c, i) =>
        c.change === 'added' ? (
          <ins key={i} className="mx-px rounded-sm bg-teal/15 text-ink decoration-teal">
            <span className="sr-only">[added: </span>
            {c.value}
            <span className="sr-only">]</span>
          </ins>
        ) : c.change === 'removed' ? (
          <del key={i} className="mx-px rounded-sm bg-danger/10 text-danger">
            <span className="sr-only">[removed: </span>
            {c.value}
            <span className="sr-only">]</span>
          </del>
        ) : (
          <span key={i}>{c.value}</span>
        ),
      )}
    </div>
  );
}

function RunDiff({ runs }: { runs: RunChange[] }) {
  if (runs.length === 0) return <p className="text-sm text-ink-soft">No runs then or now.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Runs compared with the last review</caption>
        <thead>
          <tr className="text-left text-ink-soft">
            <th scope="col" className="py-1 pr-2 font-medium">
              Run
            </th>
            <th scope="col" className="py-1 pr-2 font-medium">
              Change
            </th>
            <th scope="col" className="py-1 pr-2 font-medium">
              Then
            </th>
            <th scope="col" className="py-1 font-medium">
              Now
            </th>
          </tr>
        </thead>
        <tbody>
          {runs.map((r) => (
            <tr key={r.id} className={`border-t border-rule ${r.change === 'same' ? 'text-ink-soft' : ''}`}>
              <td className="py-1 pr-2">
                {r.id} · {r.actuator}
              </td>
              <td className="py-1 pr-2 font-medium">{runChangeWords[r.change]}</td>
              <td className="num py-1 pr-2">{r.before ? `${r.before.gain}, ${statusWords[r.before.status]}` : '—'}</td>
              <td className="num py-1">{r.after ? `${r.after.gain}, ${statusWords[r.after.status]}` : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
