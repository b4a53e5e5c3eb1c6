// What changed in a build since its last review: a word diff of the write-up (the `diff` package's
// diffWordsWithSpace, Myers' O(ND) algorithm [S: E. W. Myers, An O(ND) Difference Algorithm and Its
// Variations, Algorithmica 1 (1986) 251–266]) and the run list compared by run id.
import { diffWordsWithSpace } from 'diff';
import type { ReviewedRun, RunChange, TextChange } from '../schemas/review-desk.ts';

/** The write-up then and now as unchanged, added and removed pieces, in reading order. */
export function writeUpChanges(before: string, after: string): { changed: boolean; changes: TextChange[] } {
  if (before === after) return { changed: false, changes: before ? [{ value: before, change: 'same' }] : [] };
  const changes = diffWordsWithSpace(before, after).map((c): TextChange => ({
    value: c.value,
    change: c.added ? 'added' : c.removed ? 'removed' : 'same',
  }));
  return { changed: true, changes };
}

/** Runs then and now by id: the current ones in their order (added, changed or the same), then the removed ones. */
export function runChanges(before: readonly ReviewedRun[], after: readonly ReviewedRun[]): RunChange[] {
  const then = new Map(before.map((r) => [r.id, r]));
  const now = new Set(after.map((r) => r.id));
  const current = after.map((r): RunChange => {
    const b = then.get(r.id);
    const same = b && b.gain === r.gain && b.status === r.status;
    return {
      id: r.id,
      actuator: r.actuator,
      change: !b ? 'added' : same ? 'same' : 'changed',
      before: b ? { gain: b.gain, status: b.status } : null,
      after: { gain: r.gain, status: r.status },
    };
  });
  const removed = before
    .filter((r) => !now.has(r.id))
    .map((r): RunChange => ({
      id: r.id,
      actuator: r.actuator,
      change: 'removed',
      before: { gain: r.gain, status: r.status },
      after: null,
    }));
  return [...current, ...removed];
}
