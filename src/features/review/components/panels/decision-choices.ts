// The decision buttons of each kind of desk item, and the words around the note box.
import type { DecisionChoice } from '../decision/decision-form.tsx';

export const buildChoices: DecisionChoice<'publish' | 'return' | 'decline'>[] = [
  { decision: 'publish', label: 'Publish', busyLabel: 'Publishing…', variant: 'primary' },
  { decision: 'return', label: 'Return with notes', busyLabel: 'Returning…', variant: 'secondary' },
  { decision: 'decline', label: 'Decline', busyLabel: 'Declining…', variant: 'danger' },
];

/** A published build edited since review: "publish" keeps it live and clears the mark. */
export const editedChoices: DecisionChoice<'publish' | 'return' | 'decline'>[] = [
  { decision: 'publish', label: 'Keep published', busyLabel: 'Saving…', variant: 'primary' },
  { decision: 'return', label: 'Return with notes', busyLabel: 'Returning…', variant: 'secondary' },
  { decision: 'decline', label: 'Decline', busyLabel: 'Declining…', variant: 'danger' },
];

export const acceptChoices: DecisionChoice<'accept' | 'reject'>[] = [
  { decision: 'accept', label: 'Accept', withNoteLabel: 'Accept with note', busyLabel: 'Accepting…', variant: 'primary' },
  { decision: 'reject', label: 'Reject', busyLabel: 'Rejecting…', variant: 'danger' },
];

export const reportChoices: DecisionChoice<'resolve' | 'dismiss'>[] = [
  { decision: 'resolve', label: 'Resolve', busyLabel: 'Resolving…', variant: 'primary' },
  { decision: 'dismiss', label: 'Dismiss', busyLabel: 'Dismissing…', variant: 'secondary' },
];

/** Past tense of each decision, for the status line after it is saved. */
export const decidedWords: Record<string, string> = {
  publish: 'Published',
  'publish-with-runs': 'Published, with its runs without flags accepted',
  return: 'Returned with notes',
  decline: 'Declined',
  accept: 'Accepted',
  reject: 'Rejected',
  resolve: 'Resolved',
  dismiss: 'Dismissed',
};

/** The note box's hint on a run: a note is required to reject and kept with an acceptance too. */
export const RUN_NOTE_HINT =
  'Required to reject: say what looks wrong. Optional when accepting: the maker sees it with the run and in the decision mail. Only accepted runs count in the part’s statistics.';
