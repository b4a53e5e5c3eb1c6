import type { KeyboardEvent } from 'react';
import { emptyQueueText, type QueueEntry, type QueueKind } from './queue-model.ts';
import { QueueRow } from './queue-row.tsx';

const MOVES: Record<string, number> = { j: 1, ArrowDown: 1, k: -1, ArrowUp: -1 };

/**
 * One queue as a list of buttons, oldest first. While focus is in the list, j/k or ↓/↑ move to
 * the next or previous row and select it; Home/End jump to the ends.
 */
export function QueueList({
  kind,
  entries,
  selectedId,
  onSelect,
  id,
}: {
  kind: QueueKind;
  entries: QueueEntry[];
  selectedId: number | null;
  onSelect: (id: number, how: 'pointer' | 'keyboard') => void;
  id: string;
}) {
  const handleKeyDown = (e: KeyboardEvent<HTMLUListElement>) => {
    if (e.altKey || e.ctrlKey || e.metaKey) return;
    const buttons = Array.from(e.currentTarget.querySelectorAll<HTMLButtonElement>('button[data-row-id]'));
    if (buttons.length === 0) return;
    const at = buttons.findIndex((b) => b === document.activeElement);
    let target: number | null = null;
    if (e.key in MOVES) target = Math.min(buttons.length - 1, Math.max(0, (at < 0 ? -1 : at) + MOVES[e.key]));
    else if (e.key === 'Home') target = 0;
    else if (e.key === 'End') target = buttons.length - 1;
    if (target === null) return;
    e.preventDefault();
    const button = buttons[target];
    button.focus();
    onSelect(Number(button.dataset.rowId), 'keyboard');
  };

  return (
    <div id={id} role="tabpanel" aria-labelledby={`queue-tab-${kind}`}>
      {entries.length === 0 ? (
        <p className="rounded-lg border border-dashed border-rule bg-white p-5 text-center text-ink-soft">{emptyQueueText[kind]}</p>
      ) : (
        <>
          <p id={`${id}-hint`} className="mb-2 text-xs text-ink-soft">
            Oldest first.<span className="pointer-coarse:hidden"> In the list, j / k or ↓ / ↑ move between items.</span>
          </p>
          <ul className="space-y-2" aria-describedby={`${id}-hint`} onKeyDown={handleKeyDown}>
            {entries.map((entry) => (
              <li key={entry.item.id}>
                <QueueRow entry={entry} selected={entry.item.id === selectedId} onSelect={() => onSelect(entry.item.id, 'pointer')} />
              </li>
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
