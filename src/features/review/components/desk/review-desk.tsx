import { useRef, useState } from 'react';
import type { ReviewQueueDto } from '@shared/schemas/review.ts';
import { decidedWords } from '../panels/decision-choices.ts';
import { EntryPanel } from './entry-panel.tsx';
import { QueueList } from './queue-list.tsx';
import { QueueTabs } from './queue-tabs.tsx';
import { QUEUE_KINDS, entriesOf, entryKey, entryTitle, nextAfter, type QueueEntry, type QueueKind } from './queue-model.ts';

const LIST_ID = 'review-queue-list';

/** Bring the panel's top into view when it is off screen (below the list on a phone, scrolled past on a long list). */
function revealPanel(el: HTMLElement | null) {
  if (!el) return;
  const { top } = el.getBoundingClientRect();
  if (top < 0 || top > window.innerHeight * 0.6) el.scrollIntoView({ block: 'start' });
}

/**
 * The desk as a work queue: tabs per kind, the chosen queue as a list, and the selected item in a
 * side panel (stacked below on narrow screens). After a decision the next item opens and focus
 * moves to the panel, so a moderator can work through a queue from the keyboard.
 */
export function ReviewDesk({
  queue,
  kind,
  requestedId,
  onChange,
}: {
  queue: ReviewQueueDto;
  kind: QueueKind;
  requestedId: number | null;
  onChange: (next: { kind: QueueKind; id: number | null }) => void;
}) {
  const [decided, setDecided] = useState<ReadonlySet<string>>(() => new Set());
  const entries = entriesOf(queue, kind).filter((e) => !decided.has(entryKey(e)));
  const counts = Object.fromEntries(
    QUEUE_KINDS.map((k) => [k, queue.counts[k] - entriesOf(queue, k).filter((e) => decided.has(entryKey(e))).length]),
  ) as Record<QueueKind, number>;
  const selected = requestedId === null ? (entries[0] ?? null) : (entries.find((e) => e.item.id === requestedId) ?? null);
  const [message, setMessage] = useState('');
  const panel = useRef<HTMLElement>(null);

  const handleSelect = (id: number, how: 'pointer' | 'keyboard') => {
    setMessage('');
    onChange({ kind, id });
    if (how === 'pointer') requestAnimationFrame(() => revealPanel(panel.current));
  };

  const handleDecided = (entry: QueueEntry) => (decision: string) => {
    const word = entry.kind === 'edited' && decision === 'publish' ? 'Kept published' : decidedWords[decision];
    setMessage(`${word}: ${entryTitle(entry)}.`);
    setDecided((d) => new Set(d).add(entryKey(entry)));
    onChange({ kind, id: nextAfter(entries, entry.item.id) });
    panel.current?.focus();
  };

  return (
    <div className="space-y-4">
      <QueueTabs
        kind={kind}
        counts={counts}
        panelId={LIST_ID}
        onSelect={(k) => {
          setMessage('');
          onChange({ kind: k, id: null });
        }}
      />
      <p role="status" className={message ? 'rounded-md border border-teal/40 bg-teal/5 px-3 py-2 text-sm' : 'sr-only'}>
        {message}
      </p>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <QueueList id={LIST_ID} kind={kind} entries={entries} selectedId={selected?.item.id ?? null} onSelect={handleSelect} />
        <section
          ref={panel}
          tabIndex={-1}
          aria-label="Selected item"
          className="min-w-0 scroll-mt-4 rounded-lg border border-rule bg-white p-4"
        >
          {selected ? (
            <EntryPanel key={`${selected.kind}-${selected.item.id}`} entry={selected} onDecided={handleDecided(selected)} />
          ) : requestedId !== null ? (
            <p className="text-ink-soft">This item is no longer waiting: a moderator has decided it already. Pick another from the list.</p>
          ) : (
            <p className="text-ink-soft">Nothing to look at in this queue.</p>
          )}
        </section>
      </div>
    </div>
  );
}
