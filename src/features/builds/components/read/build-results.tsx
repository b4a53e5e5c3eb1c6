import { Link } from 'react-router-dom';
import { type BuildListDto } from '@shared/schemas/build.ts';
import { instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { Pager } from '@/components/ui/pager.tsx';
import { BuildCard } from './build-card.tsx';
import { PendingMarker } from './gain-list.tsx';
import type { useBuildSearch } from './use-build-search.ts';

function describe(total: number, search: ReturnType<typeof useBuildSearch>): string {
  const n = `${total} published ${total === 1 ? 'build' : 'builds'}`;
  const kind = search.kind ? ` of kind “${instrumentKindLabels[search.kind]}”` : '';
  const q = search.q ? ` matching “${search.q}”` : '';
  return `${n}${kind}${q}`;
}

/** The cards of one page with a count, the empty cases and the pager. */
export function BuildResults({ data, search, stale }: { data: BuildListDto; search: ReturnType<typeof useBuildSearch>; stale: boolean }) {
  const pageCount = Math.max(1, Math.ceil(data.total / data.pageSize));
  const anyPending = data.items.some((b) => b.gains.some((g) => g.runStatus === 'pending'));
  return (
    <div aria-busy={stale}>
      <p role="status" className="mb-3 text-sm text-ink-soft">
        {describe(data.total, search)}
      </p>
      {data.items.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          {data.total > 0 ? (
            <p>
              There is no page <span className="num">{search.page}</span>; this search has <span className="num">{pageCount}</span>.{' '}
              <Link className="text-copper underline" to={search.hrefFor(1)}>
                Go to page 1
              </Link>
            </p>
          ) : search.filtered ? (
            <p>
              No published build matches this search.{' '}
              <Link className="text-copper underline" to={search.clearHref}>
                Show all builds
              </Link>
            </p>
          ) : (
            <p>No builds have been published yet. The first one could be yours.</p>
          )}
        </div>
      ) : (
        <ul aria-label="Builds" className={`grid auto-rows-fr gap-4 sm:grid-cols-2 lg:grid-cols-3 ${stale ? 'opacity-60' : ''}`}>
          {data.items.map((b) => (
            <li key={b.id} className="flex">
              <BuildCard build={b} />
            </li>
          ))}
        </ul>
      )}
      {anyPending && (
        <p className="mt-3 flex items-center gap-1 text-xs text-ink-soft">
          <PendingMarker /> gain from a calibration run that is still pending review
        </p>
      )}
      <Pager page={search.page} pageCount={pageCount} hrefFor={search.hrefFor} label="Pages of builds" />
    </div>
  );
}
