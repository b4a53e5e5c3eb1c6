import { formatWithUncertainty } from '@shared/format/measured-number.ts';
// Display helpers for the review desk: how long something has waited, dates, and measured numbers.

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** "3 days", "5 hours" or "less than an hour" since an ISO timestamp. */
export function age(iso: string | null | undefined, now = Date.now()): string {
  if (!iso) return 'unknown time';
  const ms = Math.max(0, now - new Date(iso).getTime());
  if (ms < HOUR) return 'less than an hour';
  if (ms < DAY) return plural(Math.floor(ms / HOUR), 'hour');
  return plural(Math.floor(ms / DAY), 'day');
}

/** A number to `digits` significant figures without trailing zeros or exponent noise. */
export function sig(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(x))));
  return x.toFixed(Math.min(decimals, 10));
}

/** "123.5 ± 2.3": the shared GUM rounding (the uncertainty to two significant figures, the value to the same place). */
export function withUncertainty(value: number, halfWidth: number | null | undefined): string {
  const f = formatWithUncertainty(value, halfWidth);
  return f.uncertainty === null ? f.value : `${f.value} ± ${f.uncertainty}`;
}

/** "4 photos", "1 entry": a count with its noun. */
export const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** First letter upper case ("calibration run 18" → "Calibration run 18"). */
export const sentenceCase = (s: string) => (s ? s[0].toUpperCase() + s.slice(1) : s);

/** Report and audit target types in words. */
export const targetTypeWords: Record<string, string> = {
  build: 'build',
  run: 'calibration run',
  part: 'part',
  listing: 'listing',
  report: 'report',
  user: 'account',
  comment: 'comment',
};
