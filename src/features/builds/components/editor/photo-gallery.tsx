import { useEffect, useMemo, useState } from 'react';
import type { BuildDto } from '@shared/schemas/build.ts';
import { useReorderPhotos } from '../../api/photos.ts';
import { GalleryPhoto } from './gallery-photo.tsx';
import { errorMessage } from './server-errors.ts';

/** The build's stored photos in order; moving one keeps the keyboard focus on the moved photo's button. */
export function PhotoGallery({ build }: { build: BuildDto }) {
  const reorder = useReorderPhotos(build.id);
  const [focus, setFocus] = useState<{ id: number; dir: 'up' | 'down'; at: number } | null>(null);
  const photos = useMemo(() => [...build.photos].sort((a, b) => a.position - b.position || a.id - b.id), [build.photos]);

  useEffect(() => {
    // Wait until the moved photo is drawn at its new place (the reorder shows optimistically a tick later).
    if (!focus || photos[focus.at]?.id !== focus.id) return;
    const wanted = document.getElementById(`photo-${focus.id}-${focus.dir}`) as HTMLButtonElement | null;
    const other = document.getElementById(`photo-${focus.id}-${focus.dir === 'up' ? 'down' : 'up'}`) as HTMLButtonElement | null;
    (wanted && !wanted.disabled ? wanted : other)?.focus();
    setFocus(null);
  }, [focus, photos]);

  const move = (index: number, dir: -1 | 1) => {
    const ids = photos.map((p) => p.id);
    const [moved] = ids.splice(index, 1);
    ids.splice(index + dir, 0, moved);
    reorder.mutate(ids);
    setFocus({ id: moved, dir: dir === -1 ? 'up' : 'down', at: index + dir });
  };

  if (photos.length === 0) return <p className="text-sm text-ink-soft">No photos yet.</p>;
  return (
    <div>
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Photos of this build">
        {photos.map((p, i) => (
          <GalleryPhoto key={p.id} buildId={build.id} photo={p} index={i} count={photos.length} isCover={build.cover?.id === p.id}
            entries={build.entries} onMove={(dir) => move(i, dir)} />
        ))}
      </ul>
      {reorder.error && <p role="alert" className="mt-2 text-sm text-danger">{errorMessage(reorder.error)}</p>}
    </div>
  );
}
