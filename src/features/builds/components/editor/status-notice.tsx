import type { BuildDto } from '@shared/schemas/build.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { WHAT_HAPPENS_NEXT } from './review-section.tsx';

/** What the build's review state means for editing, with the moderator's note when it came back. */
export function StatusNotice({ build }: { build: BuildDto }) {
  switch (build.status) {
    case 'submitted':
      return (
        <Notice title="Submitted for review">
          <p>{WHAT_HAPPENS_NEXT}</p>
        </Notice>
      );
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
