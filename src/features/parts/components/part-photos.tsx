import { lazy, Suspense } from 'react';
import type { PartDetailDto } from '@shared/schemas/part.ts';
import { PhotoGrid } from '@/components/photos/photo-grid.tsx';

/** The photo manager, loaded for those who may use it. */
const LazyPartPhotoManager = lazy(() => import('./part-photo-manager.tsx').then((m) => ({ default: m.PartPhotoManager })));

/** What the part looks like; its proposer and moderators also get the photo manager below. Nothing at all when there is nothing to show or do. */
export function PartPhotos({ part }: { part: PartDetailDto }) {
  const canEdit = part.abilities.editPhotos;
  if (!canEdit && part.photos.length === 0) return null;
  return (
    <section aria-labelledby="part-photos-title" className="space-y-3">
      <h2 id="part-photos-title" className="text-lg font-semibold">
        Photos
      </h2>
      {part.photos.length > 0 ? (
        <PhotoGrid photos={part.photos} label="Photos of this part" columns="grid-cols-2 sm:grid-cols-3" />
      ) : (
        <p className="rounded-lg border border-dashed border-rule bg-white p-3 text-sm text-ink-soft">
          No photos of this part yet. A clear one of the bare part helps others recognise it.
        </p>
      )}
      {canEdit && (
        <Suspense fallback={<p className="text-sm text-ink-soft">Opening the photo manager…</p>}>
          <LazyPartPhotoManager part={part} />
        </Suspense>
      )}
    </section>
  );
}
