import type { ListingKind, ListingStatus } from '@shared/schemas/listing.ts';
import type { BadgeTone } from '@/components/ui/status-badge.tsx';

/** "Offering" / "Seeking", as badges and filters say it. */
export const kindLabels: Record<ListingKind, string> = { offering: 'Offering', seeking: 'Seeking' };

/** Words and colour of each listing state. */
export const statusBadge: Record<ListingStatus, { label: string; tone: BadgeTone }> = {
  open: { label: 'Open', tone: 'info' },
  reserved: { label: 'Reserved', tone: 'caution' },
  closed: { label: 'Closed', tone: 'neutral' },
};

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const timeFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
  timeZone: 'UTC',
});

/** Three-letter months ("Sept" is en-GB's own). */
const shortMonth = (f: Intl.DateTimeFormat, iso: string) =>
  f
    .formatToParts(new Date(iso))
    .map((p) => (p.type === 'month' ? p.value.slice(0, 3) : p.value))
    .join('');

/** "12 Mar 2025". */
export const formatDay = (iso: string) => shortMonth(dateFormat, iso);
/** "12 Mar, 14:05 UTC", for messages. */
export const formatMoment = (iso: string) => `${shortMonth(timeFormat, iso)} UTC`;
