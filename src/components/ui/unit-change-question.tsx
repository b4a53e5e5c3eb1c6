import { Button } from '@/components/ui/button.tsx';

/** Asks, after a unit change, whether pasted numbers that were not rewritten really are in the new unit. */
export function UnitChangeQuestion({ unit, onKeep, onUndo }: { unit: string; onKeep: () => void; onUndo: () => void }) {
  return (
    <div role="alert" className="rounded-md border border-l-4 border-amber bg-amber/10 p-3 text-sm">
      <p>The pasted numbers were not changed: they are now read as {unit}. Is that what they are?</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={onKeep}>
          Yes, they are in {unit}
        </Button>
        <Button variant="ghost" onClick={onUndo}>
          No, put the unit back
        </Button>
      </div>
    </div>
  );
}
