import type { ListingKind } from '@shared/schemas/listing-vocabulary.ts';
import { kindLabels } from './labels.ts';

/** Offering (teal, filled) or Seeking (amber outline); the word carries the meaning. */
export function KindBadge({ kind }: { kind: ListingKind }) {
  return (
    <span
      className={
        `inline-flex items-center rounded px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide ` +
        `${kind === 'offering' ? 'bg-teal text-white' : 'border border-amber bg-amber/15 text-ink'}`
      }
    >
      {kindLabels[kind]}
    </span>
  );
}
