import { describe, expect, test } from 'vitest';
import { runChanges, writeUpChanges } from '@shared/review/resubmission-diff.ts';
import type { ReviewedRun } from '@shared/schemas/review-desk.ts';

describe('writeUpChanges', () => {
  test('when nothing changed, then one unchanged piece and changed false [calc]', () => {
    expect(writeUpChanges('Same text.', 'Same text.')).toEqual({ changed: false, changes: [{ value: 'Same text.', change: 'same' }] });
    expect(writeUpChanges('', '')).toEqual({ changed: false, changes: [] });
  });

  test('when a word is replaced, then the old and the new text read back from the removed and added pieces [calc]', () => {
    const before = 'Coarse approach by screw, then the piezo tube.';
    const after = 'Coarse approach by worm gear, then the piezo tube.';
    const { changed, changes } = writeUpChanges(before, after);
    expect(changed).toBe(true);
    const text = (keep: string) =>
      changes
        .filter((c) => c.change === 'same' || c.change === keep)
        .map((c) => c.value)
        .join('');
    expect(text('removed')).toBe(before);
    expect(text('added')).toBe(after);
    expect(changes.filter((c) => c.change === 'removed').map((c) => c.value.trim())).toEqual(['screw']);
  });
});

describe('runChanges', () => {
  const run = (id: number, gain: string, status: ReviewedRun['status'] = 'pending'): ReviewedRun => ({
    id,
    actuator: 'X axis · bar',
    gain,
    status,
  });

  test('when runs are kept, changed, added and removed, then each is named so, the removed last [calc]', () => {
    const before = [run(1, '40 ± 1 nm/V (95 %)'), run(2, '41 ± 1 nm/V (95 %)'), run(3, '5 ± 1 nm/V (95 %)')];
    const after = [run(1, '40 ± 1 nm/V (95 %)'), run(2, '41 ± 1 nm/V (95 %)', 'accepted'), run(4, '39 ± 1 nm/V (95 %)')];
    expect(runChanges(before, after).map((r) => [r.id, r.change])).toEqual([
      [1, 'same'],
      [2, 'changed'],
      [4, 'added'],
      [3, 'removed'],
    ]);
    expect(runChanges(before, after)[1]).toMatchObject({ before: { status: 'pending' }, after: { status: 'accepted' } });
  });
});
