import { ApiError } from '@/lib/api-client.ts';

/** What the desk says when a decision fails: the server's words, or what a 409 means here. */
export function decisionErrorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.code === 'not_waiting') return `${error.message} Someone else decided it first; the desk has been reloaded.`;
    if (error.code === 'plan_changed') return `${error.message} The preview has been reloaded.`;
    if (error.code === 'own_work') return `${error.message} Four eyes: nobody decides on their own build, run, part, listing or report.`;
    if (error.status === 403) return 'Only moderators can decide on the review desk.';
    return error.message || 'The decision was not saved; try again.';
  }
  return error instanceof Error ? error.message : 'The decision was not saved; try again.';
}

/** The server's message about the note field, if its validation named it. */
export function noteIssue(error: unknown): string | null {
  if (!(error instanceof ApiError) || !Array.isArray(error.details)) return null;
  const issue = (error.details as { path?: unknown; message?: unknown }[]).find((d) => d?.path === 'note' && typeof d.message === 'string');
  return issue ? String(issue.message) : null;
}
