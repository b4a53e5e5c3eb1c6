import { lazy, Suspense } from 'react';
import { useNavigate } from 'react-router-dom';
import type { BuildDto } from '@shared/schemas/build.ts';
import { buildStatusLabels } from '@shared/schemas/build-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { paths } from '@/config/paths.ts';
import { useSubmitBuild } from '../../api/submit-build.ts';
import { useDeleteBuild } from '../../api/delete-build.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { EditorSection } from './editor-section.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { ReviewThread } from '@/components/review-thread/review-thread.tsx';

/** The flag checks load only for a build with pending runs: most editor visits have nothing to flag. */
const LazyBuildRunFlags = lazy(() => import('./build-run-flags.tsx').then((m) => ({ default: m.BuildRunFlags })));

export const WHAT_HAPPENS_NEXT =
  "A moderator checks the write-up and runs. While it waits you can't edit it; you'll get an e-mail when it is published or returned with notes.";

/** Submit for review (drafts and returned builds) and delete a draft; shown while the build can be edited. */
export function ReviewSection({ build }: { build: BuildDto }) {
  const navigate = useNavigate();
  const submit = useSubmitBuild(build.id);
  const remove = useDeleteBuild(build.id);
  const error = submit.error ?? remove.error;
  const { abilities } = build;
  const noRuns = build.actuators.every((a) => a.runs.length === 0);
  const pendingRuns = build.actuators.some((a) => a.runs.some((r) => r.status === 'pending'));

  return (
    <EditorSection
      id="review"
      title="Review"
      lead={
        <>
          Status: <strong className="text-ink">{buildStatusLabels[build.status]}</strong>
        </>
      }
    >
      {abilities.submit ? (
        <div className="space-y-3">
          <p className="max-w-prose text-sm">{WHAT_HAPPENS_NEXT}</p>
          {noRuns && (
            <p className="max-w-prose text-sm text-ink-soft">
              This build has no calibration run yet. You can submit it anyway; runs help other builders most.
            </p>
          )}
          {pendingRuns && (
            <Suspense fallback={null}>
              <LazyBuildRunFlags build={build} />
            </Suspense>
          )}
          <Button onClick={() => submit.mutate()} disabled={submit.isPending}>
            {submit.isPending ? 'Submitting…' : build.status === 'returned' ? 'Submit again for review' : 'Submit for review'}
          </Button>
        </div>
      ) : (
        <p className="max-w-prose text-sm text-ink-soft">
          This build is published. Your changes go live at once and are marked &ldquo;edited since review&rdquo; for the moderators.
        </p>
      )}
      {abilities.delete && (
        <div className="mt-6 border-t border-rule pt-4">
          <p className="mb-2 text-sm text-ink-soft">
            Deleting a draft removes it with its entries, photos, actuators and runs. This cannot be undone.
          </p>
          <ConfirmButton
            label="Delete draft"
            question="Delete this draft for good?"
            confirmLabel="Yes, delete the draft"
            disabled={remove.isPending}
            onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate(paths.myBuilds) })}
          />
        </div>
      )}
      {error && (
        <p role="alert" className="mt-3 text-sm text-danger">
          {errorMessage(error)}
        </p>
      )}
      <div className="mt-6 border-t border-rule pt-4">
        <ReviewThread buildId={build.id} side="maker" />
      </div>
    </EditorSection>
  );
}
