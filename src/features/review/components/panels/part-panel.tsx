import { acceptRejectInput, type QueuePartDto } from '@shared/schemas/review.ts';
import { partCategoryLabels, type PartCategory } from '@shared/schemas/part-vocabulary.ts';
import { useDecidePart } from '@/features/review/api/decide-part.ts';
import { DecisionForm } from '../decision/decision-form.tsx';
import { age } from '../format.ts';
import { formatDate } from '@shared/format/dates.ts';
import { acceptChoices } from './decision-choices.ts';
import { Facts, PanelFrame } from './panel-frame.tsx';

/** A proposed registry part: its fields, then accept into the parts registry / reject. */
export function PartPanel({ part, onDecided }: { part: QueuePartDto; onDecided: (decision: string) => void }) {
  const decide = useDecidePart();
  return (
    <PanelFrame
      eyebrow="Part proposed for the parts registry"
      title={part.name}
      meta={
        <>
          proposed by {part.author?.login ?? 'unknown'} · {formatDate(part.createdAt)} · {age(part.createdAt)} waiting
        </>
      }
      decision={
        <DecisionForm
          id={`part-${part.id}`}
          schema={acceptRejectInput}
          choices={acceptChoices}
          noteLabel="Note to the proposer"
          noteHint="Required to reject, e.g. “duplicate of an existing part”. Accepting lists the part in the parts registry."
          onDecide={async (v) => {
            await decide.mutateAsync({ id: part.id, ...v });
            onDecided(v.decision);
          }}
        />
      }
    >
      <Facts
        items={[
          ['Name', part.name],
          ['Category', partCategoryLabels[part.category as PartCategory] ?? part.category],
          ['Salvaged from', part.salvageSource ?? '—'],
          ['Material', part.material ?? '—'],
          ['Notes', part.notes ? <span className="whitespace-pre-line">{part.notes}</span> : '—'],
        ]}
      />
    </PanelFrame>
  );
}
