import type { BuildDto } from '@shared/schemas/build.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** The review desk's word on a build: the moderator's note (returned/declined), and for the owner where the build stands. */
export function ReviewNotices({ build, viewerIsOwner }: { build: BuildDto; viewerIsOwner: boolean }) {
  const notices = [];
  if (build.status === 'returned') {
    notices.push(
      <Notice key="returned" tone="caution" title="Returned with notes from the review desk">
        {build.reviewNote ? <p className="whitespace-pre-line">{build.reviewNote}</p> : <p>No note was left.</p>}
        {viewerIsOwner && <p className="text-ink-soft">Change what the note asks for, then submit the build again.</p>}
      </Notice>,
    );
  } else if (build.status === 'declined') {
    notices.push(
      <Notice key="declined" tone="danger" title="Declined by the review desk">
        {build.reviewNote ? <p className="whitespace-pre-line">{build.reviewNote}</p> : <p>No note was left.</p>}
        <p className="text-ink-soft">A declined build stays visible to its maker and to moderators only, and can no longer be edited.</p>
      </Notice>,
    );
  } else if (build.status === 'published' && build.reviewNote) {
    notices.push(
      <Notice key="published-note" title="Note from the review desk">
        <p className="whitespace-pre-line">{build.reviewNote}</p>
        {viewerIsOwner && (
          <p className="text-ink-soft">
            {build.reviewNotePublic
              ? 'The moderator made this note public: visitors see it too.'
              : 'Only you and moderators see this note.'}
          </p>
        )}
      </Notice>,
    );
  }
  if (build.status === 'submitted' && viewerIsOwner) {
    notices.push(
      <Notice key="submitted" title="Pending review">
        <p>A moderator will look at it. Until then it cannot be edited, and only you and moderators can see it.</p>
      </Notice>,
    );
  } else if (build.status === 'draft' && viewerIsOwner) {
    notices.push(
      <Notice key="draft" title="Draft">
        <p>Only you and moderators can see this build. Submit it for review when it is ready to be published.</p>
      </Notice>,
    );
  } else if (build.status === 'published' && build.editedSinceReview && viewerIsOwner) {
    notices.push(
      <Notice key="edited" title="Edited since review">
        <p>Your changes are live. The review desk sees this build marked as edited since review and may look at it again.</p>
      </Notice>,
    );
  }
  return notices.length ? <div className="mb-6 space-y-3">{notices}</div> : null;
}
