import { useEffect, useMemo, useState } from 'react';

interface Ordered {
  id: number;
  position: number;
}

/**
 * Photos in display order, and `move(index, ±1)` that sends the new id order to `reorder`. After the
 * move lands, keyboard focus follows the moved photo's Earlier/Later button (ids `photo-<id>-up|down`).
 */
export function usePhotoOrder<P extends Ordered>(photos: P[], reorder: (ids: number[]) => void) {
  const [focus, setFocus] = useState<{ id: number; dir: 'up' | 'down'; at: number } | null>(null);
  const ordered = useMemo(() => [...photos].sort((a, b) => a.position - b.position || a.id - b.id), [photos]);

  useEffect(() => {
    // Wait until the moved photo is drawn at its new place.
    if (!focus || ordered[focus.at]?.id !== focus.id) return;
    const wanted = document.getElementById(`photo-${focus.id}-${focus.dir}`) as HTMLButtonElement | null;
    const other = document.getElementById(`photo-${focus.id}-${focus.dir === 'up' ? 'down' : 'up'}`) as HTMLButtonElement | null;
    (wanted && !wanted.disabled ? wanted : other)?.focus();
    setFocus(null);
  }, [focus, ordered]);

  const move = (index: number, dir: -1 | 1) => {
    const ids = ordered.map((p) => p.id);
    const [moved] = ids.splice(index, 1);
    ids.splice(index + dir, 0, moved!);
    reorder(ids);
    setFocus({ id: moved!, dir: dir === -1 ? 'up' : 'down', at: index + dir });
  };
  return { ordered, move };
}
