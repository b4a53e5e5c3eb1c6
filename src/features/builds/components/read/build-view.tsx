import type { ReactNode } from 'react';
import type { BuildDto } from '@shared/schemas/build.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { ActuatorList } from './actuator-list.tsx';
import { BuildHeader } from './build-header.tsx';
import { LogEntries } from './log-entries.tsx';
import { PhotoGrid } from '@/components/photos/photo-grid.tsx';
import { ReviewNotices } from './review-notices.tsx';
import { BuildComments } from './build-comments.tsx';

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
export function BuildView({ build, viewerIsOwner, signedIn = false }: { build: BuildDto; viewerIsOwner: boolean; signedIn?: boolean }) {
  const buildPhotos = build.photos.filter((p) => p.entryId === null);
  return (
    <article>
      <BuildHeader build={build} />
      <ReviewNotices build={build} viewerIsOwner={viewerIsOwner} />
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
      {build.status === 'published' && (
        <Section id="comments" title="Comments">
          <BuildComments buildId={build.id} signedIn={signedIn} />
        </Section>
      )}
    </article>
  );
}
