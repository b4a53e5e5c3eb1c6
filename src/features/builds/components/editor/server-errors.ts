import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api-client.ts';

interface FieldIssue {
  path: string;
  message: string;
}

const isIssueList = (d: unknown): d is FieldIssue[] =>
  Array.isArray(d) &&
  d.every((i) => i && typeof i === 'object' && typeof (i as FieldIssue).path === 'string' && typeof (i as FieldIssue).message === 'string');

/** What to tell a person about a failed request, in one sentence. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.code === 'build_locked') return error.message;
    if (error.status === 0) return error.message;
    return error.message || 'That did not work; try again.';
  }
  return error instanceof Error ? error.message : 'That did not work; try again.';
}

/**
 * Put the server's `details` on the form fields they name (`points.3.volts` works too); whatever
 * names no field of this form, or a failure without details, lands on `root.server`.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  isField: (path: string) => boolean,
): void {
  const details = error instanceof ApiError && isIssueList(error.details) ? error.details : [];
  const unplaced: string[] = [];
  for (const issue of details) {
    if (issue.path && isField(issue.path)) setError(issue.path as Path<T>, { type: 'server', message: issue.message });
    else unplaced.push(issue.message);
  }
  if (details.length === 0 || unplaced.length > 0) {
    setError('root.server' as Path<T>, { type: 'server', message: unplaced.length > 0 ? unplaced.join(' ') : errorMessage(error) });
  }
}

/** A field test from a list of top-level names (nested paths match their first segment). */
export const fieldsOf = (names: readonly string[]) => (path: string) => names.includes(path.split('.')[0]);
