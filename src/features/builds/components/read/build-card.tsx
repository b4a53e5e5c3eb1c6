import { Link } from 'react-router-dom';
import { type BuildSummaryDto } from '@shared/schemas/build.ts';
import { buildStageLabels, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { paths } from '@/config/paths.ts';
import { CoverTile } from './cover-tile.tsx';
import { GainList } from './gain-list.tsx';

const card = [
  'relative flex min-w-0 flex-1 flex-col overflow-hidden rounded-lg border border-rule bg-white',
  'transition-colors hover:border-copper focus-within:ring-2 focus-within:ring-copper',
].join(' ');

/**
 * One published build on the index: cover, kind, title (the link), maker, stage and its key gains. Every card is
 * the same size, with a photo or the drawn tile: it fills its grid cell, and the grid's rows share one height.
 */
export function BuildCard({ build }: { build: BuildSummaryDto }) {
  return (
    <article className={card}>
      <CoverTile cover={build.cover} seed={build.id} />
      <div className="flex flex-1 flex-col gap-2 p-4">
        <p className="text-xs font-medium uppercase tracking-wide text-teal-dark">{instrumentKindLabels[build.instrumentKind]}</p>
        <h2 className="text-lg font-semibold leading-snug">
          <Link to={paths.build(build.id)} className="after:absolute after:inset-0 focus-visible:outline-none">
            {build.title}
          </Link>
        </h2>
        <p className="line-clamp-2 text-sm text-ink-soft">{build.summary}</p>
        <p className="mt-auto flex flex-wrap items-center gap-x-2 text-xs text-ink-soft">
          <span>
            by <span className="font-medium text-ink">{build.owner.login}</span>
          </span>
          <span aria-hidden="true">·</span>
          <span>{buildStageLabels[build.stage]}</span>
        </p>
        <GainList gains={build.gains} />
      </div>
    </article>
  );
}
