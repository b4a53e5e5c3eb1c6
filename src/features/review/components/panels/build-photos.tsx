import { useState } from 'react';
import type { PhotoDto } from '@shared/schemas/build.ts';
import { Lightbox } from '@/components/ui/lightbox.tsx';

/** The build's photos as thumbnails; each opens large in the lightbox. */
export function BuildPhotos({ photos }: { photos: PhotoDto[] }) {
  const [open, setOpen] = useState<number | null>(null);
  if (photos.length === 0) return <p className="text-sm text-ink-soft">No photos.</p>;
  return (
    <>
      <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
        {photos.map((p, i) => (
          <li key={p.id}>
            <button
              type="button"
              onClick={() => setOpen(i)}
              className="block w-full overflow-hidden rounded border border-rule bg-paper-deep hover:border-copper"
              aria-label={`Open photo: ${p.alt}`}
            >
              <img src={p.thumbUrl} alt="" width={p.width} height={p.height} loading="lazy" className="aspect-square w-full object-cover" />
            </button>
          </li>
        ))}
      </ul>
      {open !== null && <Lightbox images={photos} index={open} onIndexChange={setOpen} onClose={() => setOpen(null)} label="Build photo" />}
    </>
  );
}
