// The one date formatter of the app: day, month as three letters ("Sept" is en-GB's own, so it is
// cut), year, always in UTC so a date never shifts with the reader's time zone.

const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const dayTime = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
  timeZone: 'UTC',
});
const dayMonthTime = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
  timeZone: 'UTC',
});

/** An ISO timestamp or a plain YYYY-MM-DD date as a Date (a plain date is read as UTC midnight). */
const toDate = (iso: string) => new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);

const withShortMonth = (f: Intl.DateTimeFormat, d: Date) =>
  f
    .formatToParts(d)
    .map((p) => (p.type === 'month' ? p.value.slice(0, 3) : p.value))
    .join('');

/** "12 Mar 2025"; a dash when missing, the text itself when it is not a date. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = toDate(iso);
  return Number.isNaN(d.getTime()) ? iso : withShortMonth(day, d);
}

/** "12 Mar 2025, 14:05 UTC". */
export function formatDateTime(iso: string): string {
  return `${withShortMonth(dayTime, toDate(iso))} UTC`;
}

/** "12 Mar, 14:05 UTC", for messages within the year. */
export function formatMoment(iso: string): string {
  return `${withShortMonth(dayMonthTime, toDate(iso))} UTC`;
}
