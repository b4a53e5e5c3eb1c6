import { useRef, type KeyboardEvent } from 'react';
import { QUEUE_KINDS, queueLabels, type QueueKind } from './queue-model.ts';

/** The five queues as tabs with their counts; ←/→ move between tabs (the tablist pattern). */
export function QueueTabs({
  kind,
  counts,
  onSelect,
  panelId,
}: {
  kind: QueueKind;
  counts: Record<QueueKind, number>;
  onSelect: (kind: QueueKind) => void;
  panelId: string;
}) {
  const list = useRef<HTMLDivElement>(null);

  const handleKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    if (!step) return;
    e.preventDefault();
    const next = QUEUE_KINDS[(QUEUE_KINDS.indexOf(kind) + step + QUEUE_KINDS.length) % QUEUE_KINDS.length];
    onSelect(next);
    list.current?.querySelector<HTMLButtonElement>(`#queue-tab-${next}`)?.focus();
  };

  return (
    <div ref={list} role="tablist" aria-label="Queues" className="flex flex-wrap gap-2" onKeyDown={handleKeyDown}>
      {QUEUE_KINDS.map((k) => {
        const selected = k === kind;
        return (
          <button
            key={k}
            id={`queue-tab-${k}`}
            type="button"
            role="tab"
            aria-selected={selected}
            aria-controls={panelId}
            tabIndex={selected ? 0 : -1}
            onClick={() => onSelect(k)}
            className={`inline-flex items-center gap-2 rounded-md border px-3 py-1.5 text-sm font-medium transition-colors ${
              selected ? 'border-ink bg-ink text-paper' : 'border-rule bg-white text-ink hover:border-copper'
            }`}
          >
            {queueLabels[k]}
            <span
              className={`num min-w-6 rounded-full px-1.5 text-center text-xs ${
                selected ? 'bg-paper text-ink' : counts[k] > 0 ? 'bg-copper text-white' : 'bg-paper-deep text-ink-soft'
              }`}
            >
              {counts[k]}
            </span>
          </button>
        );
      })}
    </div>
  );
}
