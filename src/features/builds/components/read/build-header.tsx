import { type BuildDto } from '@shared/schemas/build.ts';
import { buildStageLabels, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { UserBadge } from '@/components/ui/user-badge.tsx';
import { paths } from '@/config/paths.ts';
import { BuildStatusBadge } from './build-status-badge.tsx';
import { formatDate } from '@shared/format/dates.ts';

/** Kind, title, review state, stage, maker, dates and what the viewer may do (links into the editor). */
export function BuildHeader({ build }: { build: BuildDto }) {
  const { abilities } = build;
  return (
    <header className="mb-6 border-b border-rule pb-5">
      <p className="text-xs font-medium uppercase tracking-wide text-teal-dark">{instrumentKindLabels[build.instrumentKind]}</p>
      <div className="mt-1 flex flex-wrap items-start justify-between gap-4">
        <h1 className="min-w-0 text-2xl font-semibold tracking-tight md:text-3xl">{build.title}</h1>
        {(abilities.edit || abilities.submit) && (
          <div className="flex flex-wrap gap-2">
            {abilities.edit && <LinkButton to={paths.editBuild(build.id)}>Edit build</LinkButton>}
            {abilities.submit && (
              <LinkButton variant="secondary" to={`${paths.editBuild(build.id)}#review`}>
                Submit for review…
              </LinkButton>
            )}
          </div>
        )}
      </div>
      <p className="mt-2 max-w-3xl text-lg text-ink-soft">{build.summary}</p>
      <div className="mt-3 flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
        <BuildStatusBadge status={build.status} />
        <span>
          <span className="text-ink-soft">Stage:</span> {buildStageLabels[build.stage]}
        </span>
        <span className="flex items-center gap-2">
          <UserBadge login={build.owner.login} name={build.owner.name} />
          <span>
            <span className="text-ink-soft">by</span> <span className="font-medium">{build.owner.login}</span>
            {build.owner.name && build.owner.name !== build.owner.login && <span className="text-ink-soft"> ({build.owner.name})</span>}
          </span>
        </span>
      </div>
      <dl className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        <div className="flex gap-1">
          <dt>Started</dt>
          <dd className="num text-ink">{formatDate(build.createdAt)}</dd>
        </div>
        {build.publishedAt && (
          <div className="flex gap-1">
            <dt>Published</dt>
            <dd className="num text-ink">{formatDate(build.publishedAt)}</dd>
          </div>
        )}
        <div className="flex gap-1">
          <dt>Last changed</dt>
          <dd className="num text-ink">{formatDate(build.updatedAt)}</dd>
        </div>
      </dl>
    </header>
  );
}
