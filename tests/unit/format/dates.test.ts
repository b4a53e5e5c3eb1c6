import { describe, expect, test } from 'vitest';
import { formatDate, formatDateTime, formatMoment } from '@shared/format/dates.ts';

describe('the one date formatter', () => {
  test('when a September date is shown, then the month has three letters and the day does not shift with the time zone', () => {
    expect(formatDate('2026-09-22')).toBe('22 Sep 2026');
    expect(formatDate('2026-09-22T23:30:00Z')).toBe('22 Sep 2026');
    expect(formatDate(null)).toBe('—');
    expect(formatDate('not a date')).toBe('not a date');
  });

  test('when a moment is shown, then it says UTC', () => {
    expect(formatDateTime('2026-03-12T14:05:00Z')).toBe('12 Mar 2026, 14:05 UTC');
    expect(formatMoment('2026-03-12T14:05:00Z')).toBe('12 Mar, 14:05 UTC');
  });
});
