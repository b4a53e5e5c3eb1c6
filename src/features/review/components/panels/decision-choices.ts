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
  { decision: 'accept', label: 'Accept', busyLabel: 'Accepting…', variant: 'primary' },
  { decision: 'reject', label: 'Reject', busyLabel: 'Rejecting…', variant: 'danger' },
];

export const reportChoices: DecisionChoice<'resolve' | 'dismiss'>[] = [
  { decision: 'resolve', label: 'Resolve', busyLabel: 'Resolving…', variant: 'primary' },
  { decision: 'dismiss', label: 'Dismiss', busyLabel: 'Dismissing…', variant: 'secondary' },
];

/** Past tense of each decision, for the status line after it is saved. */
export const decidedWords: Record<string, string> = {
  publish: 'Published',
  return: 'Returned with notes',
  decline: 'Declined',
  accept: 'Accepted',
  reject: 'Rejected',
  resolve: 'Resolved',
  dismiss: 'Dismissed',
};
