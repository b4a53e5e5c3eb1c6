import type { BuildDto } from '@shared/schemas/build.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { Button } from '@/components/ui/button.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { useWithdrawBuild } from '../../api/withdraw-build.ts';
import { WHAT_HAPPENS_NEXT } from './review-section.tsx';

/** Pending review: what happens next, and the way back to a draft before a moderator decides. */
function SubmittedNotice({ build }: { build: BuildDto }) {
  const withdraw = useWithdrawBuild(build.id);
  return (
    <Notice title="Pending review">
      <p>{WHAT_HAPPENS_NEXT}</p>
      {build.abilities.withdraw && (
        <p className="mt-2 flex flex-wrap items-center gap-2">
          <Button variant="secondary" disabled={withdraw.isPending} onClick={() => withdraw.mutate()}>
            {withdraw.isPending ? 'Withdrawing…' : 'Withdraw to draft'}
          </Button>
          <span className="text-ink-soft">to change something first; submit it again when ready.</span>
        </p>
      )}
      {withdraw.error && (
        <p role="alert" className="mt-2 text-danger">
          {errorMessage(withdraw.error)}
        </p>
      )}
    </Notice>
  );
}

/** What the build's review state means for editing, with the moderator's note when it came back. */
export function StatusNotice({ build }: { build: BuildDto }) {
  switch (build.status) {
    case 'submitted':
      return <SubmittedNotice build={build} />;
    case 'returned':
      return (
        <Notice tone="caution" title="Returned with notes">
          <p>A moderator sent this build back. Make the changes, then submit it again.</p>
          {build.reviewNote && (
            <blockquote className="mt-2 whitespace-pre-line border-l-4 border-amber bg-white/70 px-3 py-2">{build.reviewNote}</blockquote>
          )}
        </Notice>
      );
    case 'declined':
      return (
        <Notice tone="danger" title="Declined">
          <p>This build was declined and can no longer be edited.</p>
          {build.reviewNote && (
            <blockquote className="mt-2 whitespace-pre-line border-l-4 border-danger bg-white/70 px-3 py-2">{build.reviewNote}</blockquote>
          )}
        </Notice>
      );
    case 'published':
      return build.editedSinceReview ? (
        <Notice title="Published, edited since review">
          <p>Your changes are live; the review desk sees that the build changed after it was accepted.</p>
        </Notice>
      ) : null;
    default:
      return null;
  }
}
