import { plusMinusLabels, type PlusMinusKind } from '@shared/format/measured-number.ts';

/** What a ± is — "(95 %)" or "(u, k = 1)" — with the full meaning for a pointer and a screen reader. */
export function PlusMinusLabel({ kind, className = '' }: { kind: PlusMinusKind; className?: string }) {
  const label = plusMinusLabels[kind];
  return (
    <abbr title={label.long} className={`font-normal text-ink-soft no-underline ${className}`}>
      ({label.short})
    </abbr>
  );
}
