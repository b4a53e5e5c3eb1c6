import { useState } from 'react';
import { Lightbox, type LightboxImage } from '@/components/ui/lightbox.tsx';

/** A stored photo as the grid needs it: the lightbox's picture plus its thumbnail. */
export type GridPhoto = LightboxImage & { thumbUrl: string };

/** Thumbnails that open the large photo in the lightbox; the alt text is the caption. */
export function PhotoGrid({
  photos,
  label,
  columns = 'grid-cols-2 sm:grid-cols-3 md:grid-cols-4',
}: {
  photos: GridPhoto[];
  label: string;
  columns?: string;
}) {
  const [open, setOpen] = useState<number | null>(null);
  if (photos.length === 0) return null;
  return (
    <>
      <ul aria-label={label} className={`grid gap-2 ${columns}`}>
        {photos.map((p, i) => (
          <li key={p.id}>
            <button
              type="button"
              onClick={() => setOpen(i)}
              aria-haspopup="dialog"
              className="group block w-full overflow-hidden rounded-md border border-rule bg-paper-deep hover:border-copper"
            >
              <img
                src={p.thumbUrl}
                alt={p.alt}
                loading="lazy"
                className="aspect-[4/3] w-full object-cover transition-transform group-hover:scale-[1.02]"
              />
            </button>
          </li>
        ))}
      </ul>
      {open !== null && <Lightbox images={photos} index={open} onIndexChange={setOpen} onClose={() => setOpen(null)} />}
    </>
  );
}
