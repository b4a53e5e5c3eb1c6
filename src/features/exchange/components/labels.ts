import type { ListingKind, ListingStatus } from '@shared/schemas/listing-vocabulary.ts';
import type { BadgeTone } from '@/components/ui/status-badge.tsx';

/** "Offering" / "Seeking", as badges and filters say it. */
export const kindLabels: Record<ListingKind, string> = { offering: 'Offering', seeking: 'Seeking' };

/** Words and colour of each listing state. */
export const statusBadge: Record<ListingStatus, { label: string; tone: BadgeTone }> = {
  open: { label: 'Open', tone: 'info' },
  reserved: { label: 'Reserved', tone: 'caution' },
  closed: { label: 'Closed', tone: 'neutral' },
};
