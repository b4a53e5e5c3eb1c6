import { Link } from 'react-router-dom';
import { type PartDetailDto } from '@shared/schemas/part.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { PartFacts } from './part-facts.tsx';
import { PartFigures } from './part-figures.tsx';
import { PartListings } from './part-listings.tsx';
import { PartPhotos } from './part-photos.tsx';
import { PartRunsPlot } from './part-runs-plot.tsx';
import { PartRunsTable } from './part-runs-table.tsx';
import { ReportPartButton } from './report-part-button.tsx';
import { FollowButton } from '@/components/follow/follow-button.tsx';
import { PartWorkbenchLinks } from './part-workbench-links.tsx';

/** One part: its figures and plot, the part itself beside its photos and exchange listings, and the runs behind the figures. */
export function PartView({ part, signedIn }: { part: PartDetailDto; signedIn: boolean }) {
  return (
    <article className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.parts} className="text-copper-dark underline">
          Parts registry
        </Link>{' '}
        <span aria-hidden="true">›</span> {partCategoryLabels[part.category]}
      </nav>
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-rule pb-4">
        <div className="min-w-0">
          <p className="text-xs font-medium uppercase tracking-wide text-teal-dark">{partCategoryLabels[part.category]}</p>
          <h1 className="text-2xl font-semibold tracking-tight">{part.name}</h1>
        </div>
        {signedIn && part.status === 'accepted' && (
          <div className="flex flex-wrap items-center gap-2">
            <FollowButton type="part" id={part.id} signedIn={signedIn} />
            <ReportPartButton partId={part.id} partName={part.name} />
          </div>
        )}
      </header>
      {part.status === 'proposed' && (
        <Notice title="Proposed: waiting for a moderator">
          This part is not listed yet. Only its proposer and the moderators can see this page until a moderator accepts it.
        </Notice>
      )}
      {part.status === 'rejected' && (
        <Notice tone="danger" title="Not accepted">
          A moderator did not accept this part into the registry.
        </Notice>
      )}
      {part.mergedIntoId !== null && (
        <Notice title="Merged">
          This part was merged into{' '}
          <Link className="underline" to={paths.part(part.mergedIntoId)}>
            another entry
          </Link>
          ; its runs count there.
        </Notice>
      )}
      <PartFigures stats={part.stats} />
      <PartWorkbenchLinks part={part} />
      <PartRunsPlot part={part} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,4fr)]">
        <PartFacts part={part} />
        <div className="min-w-0 space-y-6">
          <PartPhotos part={part} />
          <PartListings partId={part.id} listings={part.listings} signedIn={signedIn && part.status === 'accepted'} />
        </div>
      </div>
      <PartRunsTable runs={part.runs} />
    </article>
  );
}
