import { BuildPanel } from '../panels/build-panel.tsx';
import { PartPanel } from '../panels/part-panel.tsx';
import { ReportPanel } from '../panels/report-panel.tsx';
import { RunPanel } from '../panels/run-panel.tsx';
import type { QueueEntry } from './queue-model.ts';

/** The side panel matching the selected item's kind. */
export function EntryPanel({ entry, onDecided }: { entry: QueueEntry; onDecided: (decision: string) => void }) {
  switch (entry.kind) {
    case 'builds':
    case 'edited':
      return <BuildPanel build={entry.item} edited={entry.kind === 'edited'} onDecided={onDecided} />;
    case 'runs':
      return <RunPanel run={entry.item} onDecided={onDecided} />;
    case 'parts':
      return <PartPanel part={entry.item} onDecided={onDecided} />;
    case 'reports':
      return <ReportPanel report={entry.item} onDecided={onDecided} />;
  }
}
