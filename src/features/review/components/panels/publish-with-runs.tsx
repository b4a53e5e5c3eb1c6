import { useId, useState } from 'react';
import type { QueueRunDto } from '@shared/schemas/review.ts';
import type { PublishWithRunsPlan } from '@shared/schemas/review-desk.ts';
import { runName } from '@shared/review/run-name.ts';
import { Button } from '@/components/ui/button.tsx';
import { usePublishWithRuns } from '@/features/review/api/publish-with-runs.ts';
import { decisionErrorMessage } from '../decision/decision-errors.ts';
import { flagTitles } from './flag-explanations.ts';

const nameOf = (r: QueueRunDto) =>
  runName({
    actuatorLabel: r.actuatorLabel,
    partName: r.part.name,
    measuredOn: null,
    createdAt: new Date(r.createdAt),
    gainNmPerV: r.fit.gainNmPerV,
    gainCi95NmPerV: r.fit.gainCi95NmPerV,
    gainStdUncertaintyNmPerV: r.fit.gainStdUncertaintyNmPerV ?? null,
  });

/**
 * The combined decision: a preview of what it will do (publish the build, accept the runs without flags, leave
 * the flagged ones pending), then one confirmation that does it all in one transaction on the server.
 */
export function PublishWithRuns({
  buildId,
  title,
  edited,
  runs,
  plan,
  onDone,
}: {
  buildId: number;
  title: string;
  edited: boolean;
  runs: QueueRunDto[];
  plan: PublishWithRunsPlan;
  onDone: () => void;
}) {
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const publish = usePublishWithRuns();
  const noteId = useId();
  const byId = new Map(runs.map((r) => [r.id, r]));
  const verb = edited ? 'Keep published' : 'Publish';
  if (!open) {
    return (
      <Button variant="secondary" onClick={() => setOpen(true)}>
        {verb} and accept the runs without flags…
      </Button>
    );
  }
  const confirm = async () => {
    setError(null);
    try {
      await publish.mutateAsync({ buildId, acceptRunIds: plan.accept, ...(note.trim() ? { note: note.trim() } : {}) });
      onDone();
    } catch (err) {
      setError(decisionErrorMessage(err));
    }
  };
  return (
    <section aria-label="Preview of the combined decision" className="space-y-3 rounded-lg border border-teal bg-teal/5 p-3 text-sm">
      <h4 className="font-semibold">This will:</h4>
      <ol className="list-decimal space-y-1 pl-5">
        <li>
          {edited ? 'keep' : 'publish'} the build “{title}”;
        </li>
        <li>
          {plan.accept.length === 0 ? (
            'accept no runs (none is free of flags);'
          ) : (
            <>
              accept {plan.accept.length === 1 ? 'this run, which carries' : `these ${plan.accept.length} runs, which carry`} no flag:
              <ul className="list-disc pl-5">
                {plan.accept.map((id) => (
                  <li key={id}>{byId.get(id) ? nameOf(byId.get(id)!) : `run ${id}`}</li>
                ))}
              </ul>
            </>
          )}
        </li>
        {plan.stayPending.length > 0 && (
          <li>
            leave {plan.stayPending.length === 1 ? 'this flagged run' : `these ${plan.stayPending.length} flagged runs`} pending review, to
            decide on its own:
            <ul className="list-disc pl-5">
              {plan.stayPending.map((p) => (
                <li key={p.id}>
                  {byId.get(p.id) ? nameOf(byId.get(p.id)!) : `run ${p.id}`} ({p.flags.map((f) => flagTitles[f]).join(', ')})
                </li>
              ))}
            </ul>
          </li>
        )}
      </ol>
      <div>
        <label htmlFor={noteId} className="mb-1 block font-medium">
          Note to the maker (optional)
        </label>
        <textarea
          id={noteId}
          rows={2}
          value={note}
          onChange={(e) => setNote(e.target.value)}
          className="w-full rounded-md border border-rule bg-white px-2 py-1.5 text-base"
        />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button disabled={publish.isPending} onClick={() => void confirm()}>
          {publish.isPending ? 'Saving…' : `Confirm: ${verb.toLowerCase()}, accept ${plan.accept.length}`}
        </Button>
        <Button variant="ghost" disabled={publish.isPending} onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
      {error && (
        <p role="alert" className="rounded-md border border-danger bg-danger/5 px-3 py-2 text-danger">
          {error}
        </p>
      )}
    </section>
  );
}
