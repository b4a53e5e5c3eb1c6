import { Link } from 'react-router-dom';
import { type BuildSummaryDto } from '@shared/schemas/build.ts';
import { buildStageLabels, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { BuildStatusBadge } from './build-status-badge.tsx';
import { formatDate } from '@shared/format/dates.ts';
import { GainList } from './gain-list.tsx';

const whatNext: Record<BuildSummaryDto['status'], string> = {
  draft: 'Only you and moderators can see it. Submit it for review when it is ready.',
  submitted: 'Waiting for a moderator; it cannot be edited meanwhile.',
  published: 'Live for everyone.',
  returned: 'Returned to you: change what the note asks for, then submit it again.',
  declined: 'Declined; it can no longer be edited.',
};

const editable = (s: BuildSummaryDto['status']) => s === 'draft' || s === 'returned' || s === 'published';

/** One of my builds: its review state, what that means, the moderator's note and an edit link where editing is allowed. */
export function MyBuildRow({ build }: { build: BuildSummaryDto }) {
  const note = build.reviewNote && (build.status === 'returned' || build.status === 'declined');
  return (
    <li className="rounded-lg border border-rule bg-white p-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <p className="text-xs font-medium uppercase tracking-wide text-teal-dark">{instrumentKindLabels[build.instrumentKind]}</p>
          <h2 className="text-lg font-semibold leading-snug">
            <Link to={paths.build(build.id)} className="hover:text-copper hover:underline">
              {build.title}
            </Link>
          </h2>
        </div>
        {editable(build.status) && (
          <Link
            to={paths.editBuild(build.id)}
            className="rounded-md border border-teal bg-white px-3 py-1 text-sm font-medium text-teal-dark hover:bg-teal/10"
            aria-label={`Edit ${build.title}`}
          >
            Edit
          </Link>
        )}
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <BuildStatusBadge status={build.status} />
        {build.status === 'published' && build.editedSinceReview && <span className="text-xs text-ink-soft">edited since review</span>}
        <span className="text-ink-soft">
          Stage: <span className="text-ink">{buildStageLabels[build.stage]}</span>
        </span>
        <span className="text-ink-soft">
          Last changed <span className="num text-ink">{formatDate(build.updatedAt)}</span>
        </span>
      </div>
      <p className="mt-1 text-sm text-ink-soft">{whatNext[build.status]}</p>
      {note && (
        <div className="mt-3">
          <Notice tone={build.status === 'declined' ? 'danger' : 'caution'} title="Note from the review desk">
            <p className="whitespace-pre-line">{build.reviewNote}</p>
          </Notice>
        </div>
      )}
      {build.gains.length > 0 && (
        <div className="mt-3">
          <GainList gains={build.gains} />
        </div>
      )}
    </li>
  );
}
