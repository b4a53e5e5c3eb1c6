import { Button } from '@/components/ui/button.tsx';

/** "↑ Earlier" / "↓ Later" for photo `n` (1-based) of `count` in a list that keeps its order. */
export function MoveButtons({ photoId, n, count, onMove }: { photoId: number; n: number; count: number; onMove: (step: -1 | 1) => void }) {
  return (
    <>
      <Button
        id={`photo-${photoId}-up`}
        variant="ghost"
        className="px-2"
        disabled={n === 1}
        onClick={() => onMove(-1)}
        aria-label={`Move photo ${n} earlier`}
      >
        ↑ Earlier
      </Button>
      <Button
        id={`photo-${photoId}-down`}
        variant="ghost"
        className="px-2"
        disabled={n === count}
        onClick={() => onMove(1)}
        aria-label={`Move photo ${n} later`}
      >
        ↓ Later
      </Button>
    </>
  );
}
