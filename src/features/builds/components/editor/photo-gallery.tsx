import type { BuildDto } from '@shared/schemas/build.ts';
import { usePhotoOrder } from '@/components/photos/use-photo-order.ts';
import { useReorderPhotos } from '../../api/photos.ts';
import { GalleryPhoto } from './gallery-photo.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';

/** The build's stored photos in order; moving one keeps the keyboard focus on the moved photo's button. */
export function PhotoGallery({ build }: { build: BuildDto }) {
  const reorder = useReorderPhotos(build.id);
  const { ordered: photos, move } = usePhotoOrder(build.photos, reorder.mutate);

  if (photos.length === 0) return <p className="text-sm text-ink-soft">No photos yet.</p>;
  return (
    <div>
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Photos of this build">
        {photos.map((p, i) => (
          <GalleryPhoto
            key={p.id}
            buildId={build.id}
            photo={p}
            index={i}
            count={photos.length}
            isCover={build.cover?.id === p.id}
            entries={build.entries}
            onMove={(dir) => move(i, dir)}
          />
        ))}
      </ul>
      {reorder.error && (
        <p role="alert" className="mt-2 text-sm text-danger">
          {errorMessage(reorder.error)}
        </p>
      )}
    </div>
  );
}
