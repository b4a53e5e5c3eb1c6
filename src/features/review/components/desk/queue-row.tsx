import type { ReactNode } from 'react';
import { type QueueBuildDto, type QueueRunDto } from '@shared/schemas/review.ts';
import { reportReasonLabels } from '@shared/schemas/review-vocabulary.ts';
import { instrumentKindLabels, type InstrumentKind } from '@shared/schemas/build-vocabulary.ts';
import { partCategoryLabels, type PartCategory } from '@shared/schemas/part-vocabulary.ts';
import { FlagChips } from '../flag-chips.tsx';
import { age, count, sentenceCase, sig, targetTypeWords, withUncertainty } from '../format.ts';
import type { QueueEntry } from './queue-model.ts';
import { runKindLabels } from '@shared/schemas/run-vocabulary.ts';
import { runGainPlusMinus } from '@shared/export/run-figures.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

const kindLabel = (k: string) => instrumentKindLabels[k as InstrumentKind] ?? k;
const categoryLabel = (c: string) => partCategoryLabels[c as PartCategory] ?? c;

/** One queue item as a button: what it is, who sent it, how long it has waited, and the facts to triage by. */
export function QueueRow({ entry, selected, onSelect }: { entry: QueueEntry; selected: boolean; onSelect: () => void }) {
  return (
    <button
      type="button"
      data-row-id={entry.item.id}
      aria-current={selected ? 'true' : undefined}
      onClick={onSelect}
      className={`block w-full rounded-lg border bg-white p-3 text-left transition-colors hover:border-copper ${
        selected ? 'border-copper shadow-[inset_4px_0_0_var(--color-copper)]' : 'border-rule'
      }`}
    >
      <RowBody entry={entry} />
    </button>
  );
}

function Line({ title, meta, children }: { title: ReactNode; meta: ReactNode; children?: ReactNode }) {
  return (
    <>
      <span className="block font-semibold leading-snug">{title}</span>
      <span className="mt-0.5 block text-sm text-ink-soft">{meta}</span>
      {children && <span className="mt-1.5 block text-sm">{children}</span>}
    </>
  );
}

function RowBody({ entry }: { entry: QueueEntry }) {
  switch (entry.kind) {
    case 'builds':
      return <BuildFacts build={entry.item} when={`${age(entry.item.submittedAt ?? entry.item.updatedAt)} waiting`} />;
    case 'edited':
      return <BuildFacts build={entry.item} when={`edited ${age(entry.item.updatedAt)} ago`} />;
    case 'runs':
      return <RunFacts run={entry.item} />;
    case 'parts': {
      const p = entry.item;
      return (
        <Line
          title={p.name}
          meta={
            <>
              {categoryLabel(p.category)} · by {p.author?.login ?? 'unknown'} · {age(p.createdAt)} waiting
            </>
          }
        >
          {p.salvageSource && <span className="text-ink-soft">Salvaged from {p.salvageSource}</span>}
        </Line>
      );
    }
    case 'reports': {
      const r = entry.item;
      return (
        <Line
          title={sentenceCase(r.targetLabel)}
          meta={
            <>
              Report on a {targetTypeWords[r.targetType]} · by {r.reporter.login} · {age(r.createdAt)} waiting
            </>
          }
        >
          <span className="font-medium">{reportReasonLabels[r.reason]}</span>
          {r.note && <span className="text-ink-soft">: {r.note.length > 90 ? `${r.note.slice(0, 90)}…` : r.note}</span>}
        </Line>
      );
    }
  }
}

function BuildFacts({ build: b, when }: { build: QueueBuildDto; when: string }) {
  return (
    <Line
      title={b.title}
      meta={
        <>
          {kindLabel(b.instrumentKind)} · by {b.author.login} · {when}
        </>
      }
    >
      <span className="text-xs text-ink-soft">
        {count(b.photoCount, 'photo')} · {count(b.entryCount, 'entry', 'entries')} · {count(b.actuatorCount, 'actuator')} ·{' '}
        {count(b.pendingRunCount, 'pending run')}
      </span>
    </Line>
  );
}

function RunFacts({ run: r }: { run: QueueRunDto }) {
  return (
    <Line
      title={r.part.name}
      meta={
        <>
          {r.actuatorLabel ?? `${r.axis} axis`} in “{r.buildTitle}” · by {r.author.login} · {age(r.createdAt)} waiting
        </>
      }
    >
      <span className="flex flex-wrap gap-x-3 gap-y-0.5">
        <span>
          <span className="num font-medium">{withUncertainty(r.fit.gainNmPerV, runGainPlusMinus(r.fit).halfWidth)}</span> nm/V{' '}
          <PlusMinusLabel kind={runGainPlusMinus(r.fit).kind} className="text-xs" /> · {runKindLabels[r.kind].toLowerCase()}
        </span>
        {r.kind === 'points' && (
          <>
            <span>
              R² <span className="num">{r.fit.r2 === null ? '—' : r.fit.r2.toFixed(4)}</span>
            </span>
            <span>
              hysteresis <span className="num">{r.fit.hysteresisPctFs === null ? '—' : `${sig(r.fit.hysteresisPctFs, 2)} %`}</span>
            </span>
          </>
        )}
      </span>
      {r.flags.length > 0 && (
        <span className="mt-1.5 block">
          <FlagChips flags={r.flags} inline />
        </span>
      )}
    </Line>
  );
}
