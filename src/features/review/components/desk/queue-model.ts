// The desk's five queues: their names in our words, how to read their items and what comes next.
import type { QueueBuildDto, QueuePartDto, QueueReportDto, QueueRunDto, ReviewQueueDto } from '@shared/schemas/review.ts';

export const QUEUE_KINDS = ['builds', 'runs', 'parts', 'reports', 'edited'] as const;
export type QueueKind = (typeof QUEUE_KINDS)[number];

export const queueLabels: Record<QueueKind, string> = {
  builds: 'Builds submitted',
  runs: 'Calibration runs pending',
  parts: 'Parts proposed',
  reports: 'Reports open',
  edited: 'Edited since review',
};

export const emptyQueueText: Record<QueueKind, string> = {
  builds: 'No build is pending review.',
  runs: 'No calibration run is pending review.',
  parts: 'No proposed part is waiting.',
  reports: 'No report is open.',
  edited: 'No published build has been edited since its review.',
};

/** An item of one queue, tagged with its kind so rows and panels can tell them apart. */
export type QueueEntry =
  | { kind: 'builds' | 'edited'; item: QueueBuildDto }
  | { kind: 'runs'; item: QueueRunDto }
  | { kind: 'parts'; item: QueuePartDto }
  | { kind: 'reports'; item: QueueReportDto };

/** The items of one queue, oldest first as the server sends them. */
export function entriesOf(queue: ReviewQueueDto, kind: QueueKind): QueueEntry[] {
  switch (kind) {
    case 'builds':
    case 'edited':
      return queue[kind].map((item) => ({ kind, item }));
    case 'runs':
      return queue.runs.map((item) => ({ kind, item }));
    case 'parts':
      return queue.parts.map((item) => ({ kind, item }));
    case 'reports':
      return queue.reports.map((item) => ({ kind, item }));
  }
}

export const isQueueKind = (v: string | null): v is QueueKind => (QUEUE_KINDS as readonly string[]).includes(v ?? '');

/** The first queue with something waiting, so the desk opens where the work is. */
export const firstBusyKind = (queue: ReviewQueueDto): QueueKind => QUEUE_KINDS.find((k) => queue.counts[k] > 0) ?? 'builds';

/** Which thing an entry is, across queues (a build can sit in two), to hide it at once when decided. */
export const entryKey = (e: QueueEntry) => `${e.kind === 'edited' ? 'builds' : e.kind}:${e.item.id}`;

/** The item to show after `id` is decided: the one below it, else the one above, else none. */
export function nextAfter(entries: QueueEntry[], id: number): number | null {
  const i = entries.findIndex((e) => e.item.id === id);
  if (i < 0) return entries[0]?.item.id ?? null;
  return entries[i + 1]?.item.id ?? entries[i - 1]?.item.id ?? null;
}

/** A short name of an entry for headings and status messages. */
export function entryTitle(entry: QueueEntry): string {
  switch (entry.kind) {
    case 'builds':
    case 'edited':
      return entry.item.title;
    case 'runs':
      return `Calibration run of ${entry.item.part.name}`;
    case 'parts':
      return entry.item.name;
    case 'reports':
      return `Report on ${entry.item.targetLabel}`;
  }
}
