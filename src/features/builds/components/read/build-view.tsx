import type { ReactNode } from 'react';
import type { BuildDto } from '@shared/schemas/build.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { ActuatorList } from './actuator-list.tsx';
import { BuildHeader } from './build-header.tsx';
import { LogEntries } from './log-entries.tsx';
import { PhotoGrid } from '@/components/photos/photo-grid.tsx';
import { ReviewNotices } from './review-notices.tsx';
import { BuildComments } from './build-comments.tsx';
import { FollowButton } from '@/components/follow/follow-button.tsx';
import { ReviewThread } from '@/components/review-thread/review-thread.tsx';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="mt-10">
      <h2 id={id} className="mb-4 flex items-center gap-2 text-xl font-semibold tracking-tight">
        <span aria-hidden="true" className="h-4 w-1.5 rounded-sm bg-copper" />
        {title}
      </h2>
      {children}
    </section>
  );
}

/** A whole build as readers see it: header, review notes, write-up, photos, log entries, actuators and runs. */
export function BuildView({
  build,
  viewerIsOwner,
  signedIn = false,
  reviewSide = null,
  viewerId = null,
}: {
  build: BuildDto;
  viewerIsOwner: boolean;
  signedIn?: boolean;
  /** The viewer's side of the review thread (the maker or a moderator); null: not shown. */
  reviewSide?: 'maker' | 'moderator' | null;
  viewerId?: number | null;
}) {
  const buildPhotos = build.photos.filter((p) => p.entryId === null);
  const published = build.status === 'published';
  return (
    <article>
      <BuildHeader build={build} />
      {published && signedIn && !viewerIsOwner && (
        <div className="-mt-3 mb-6 flex flex-wrap gap-x-6 gap-y-2">
          <FollowButton type="build" id={build.id} signedIn={signedIn} />
          {viewerId !== build.owner.id && <FollowButton type="maker" id={build.owner.id} signedIn={signedIn} label={build.owner.login} />}
        </div>
      )}
      <ReviewNotices build={build} viewerIsOwner={viewerIsOwner} />
      {reviewSide && (
        <div className="mt-6 rounded-lg border border-rule bg-white p-4 empty:hidden">
          <ReviewThread buildId={build.id} side={reviewSide} hideWhenEmpty={published} />
        </div>
      )}
      <Section id="write-up" title="Write-up">
        {build.body.trim() ? (
          <div className="rounded-lg border border-rule bg-white p-4 sm:p-6">
            <Markdown className="max-w-3xl [&>:first-child]:mt-0!">{build.body}</Markdown>
          </div>
        ) : (
          <p className="text-ink-soft">No write-up yet.</p>
        )}
      </Section>
      {buildPhotos.length > 0 && (
        <Section id="photos" title="Photos">
          <PhotoGrid photos={buildPhotos} label="Photos of the build" />
        </Section>
      )}
      <Section id="log" title="Log entries">
        <LogEntries entries={build.entries} />
      </Section>
      <Section id="actuators" title="Actuators and calibration runs">
        <ActuatorList actuators={build.actuators} />
      </Section>
      {published && (
        <Section id="comments" title="Comments">
          <BuildComments buildId={build.id} signedIn={signedIn} />
        </Section>
      )}
    </article>
  );
}
