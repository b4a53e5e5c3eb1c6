import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { type BuildSummaryDto } from '@shared/schemas/build.ts';
import { buildStatusLabels } from '@shared/schemas/build-vocabulary.ts';
import { formatDate } from '@shared/format/dates.ts';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { buildQueries } from '../../api/build-queries.ts';

/** What still needs the maker: returned builds first (with the moderator's note), then drafts, then what waits for review. */
const ORDER: Record<string, number> = { returned: 0, draft: 1, submitted: 2 };

function Row({ b }: { b: BuildSummaryDto }) {
  return (
    <li className="border-b border-rule px-4 py-3 last:border-b-0">
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
        <Link to={b.status === 'submitted' ? paths.build(b.id) : paths.editBuild(b.id)} className="font-medium text-copper underline">
          {b.title}
        </Link>
        <span className="text-xs text-ink-soft">
          {buildStatusLabels[b.status]} · changed <span className="num">{formatDate(b.updatedAt)}</span>
        </span>
      </div>
      {b.status === 'returned' && b.reviewNote && (
        <p className="mt-1 border-l-4 border-copper pl-2 text-sm whitespace-pre-line">
          <span className="font-medium">Moderator’s note:</span> {b.reviewNote}
        </p>
      )}
    </li>
  );
}

/** The signed-in home page's "your work": builds that still need you, and a way to start a new one. */
export function MyWork() {
  const mine = useQuery(buildQueries.mine());
  const open = (mine.data?.items ?? [])
    .filter((b) => b.status in ORDER)
    .sort((a, b) => ORDER[a.status]! - ORDER[b.status]! || b.updatedAt.localeCompare(a.updatedAt));
  return (
    <section aria-labelledby="my-work" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="my-work" className="text-xl font-semibold tracking-tight">
          Your builds in progress
        </h2>
        <LinkButton to={paths.newBuild}>Start a new build</LinkButton>
      </div>
      {mine.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Loading your builds…
        </p>
      ) : open.length === 0 ? (
        <p className="text-sm text-ink-soft">
          Nothing in progress.{' '}
          <Link to={paths.myBuilds} className="text-copper underline">
            All your builds
          </Link>
        </p>
      ) : (
        <ul className="rounded-lg border border-rule bg-white">
          {open.slice(0, 8).map((b) => (
            <Row key={b.id} b={b} />
          ))}
        </ul>
      )}
    </section>
  );
}
