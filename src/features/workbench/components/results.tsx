import { useId, type ReactNode } from 'react';
import { formatWithUncertainty, type Formatted, type PlusMinusKind } from '@shared/format/measured-number.ts';
import type { ResultWarning } from '@shared/workbench/calculators/calculator.ts';
import type { Caution } from '@shared/workbench/safety.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

/** A formatted number in monospace tabular figures, with its unit after it. */
export function Quantity({ q, className = '' }: { q: Formatted; className?: string }) {
  return (
    <span className={`whitespace-nowrap ${className}`}>
      <span className="num">{q.value}</span>
      {q.unit && <span> {q.unit}</span>}
    </span>
  );
}

/**
 * A gain in nm/V with its ± where known, saying which ± it is: "102.6 ± 1.3 nm/V (95 %)" or
 * "(u, k = 1)"; the full meaning is in the title for a pointer and a screen reader.
 */
export function Gain({
  value,
  plusMinus,
  kind,
  className = '',
}: {
  value: number;
  plusMinus?: number | null;
  kind?: PlusMinusKind;
  className?: string;
}) {
  const f = formatWithUncertainty(value, plusMinus);
  return (
    <span className={`whitespace-nowrap ${className}`}>
      <span className="num">{f.value}</span>
      {f.uncertainty && <span className="num"> ± {f.uncertainty}</span>}
      <span> nm/V</span>
      {f.uncertainty && kind && <PlusMinusLabel kind={kind} className="ml-1 align-middle text-[0.6em]" />}
    </span>
  );
}

/** The warnings a calculator attached to its result, as a list; nothing when there are none. */
export function ResultWarnings({ warnings }: { warnings: readonly ResultWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <div role="status" className="rounded-md border border-l-4 border-amber bg-amber/10 p-3 text-sm">
      <p className="font-semibold">Read this figure with care</p>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {warnings.map((w) => (
          <li key={w.code}>{w.message}</li>
        ))}
      </ul>
    </div>
  );
}

/** The results card: a heading, the headline, rows, and the basis of the numbers. */
export function ResultPanel({
  title = 'Results',
  headline,
  children,
  basis,
}: {
  title?: string;
  headline?: ReactNode;
  children?: ReactNode;
  basis?: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="rounded-lg border border-rule bg-white p-4">
      <h2 id={id} className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
        {title}
      </h2>
      {headline && <div className="mt-2">{headline}</div>}
      {children && <dl className="mt-3 divide-y divide-rule border-t border-rule">{children}</dl>}
      {basis && (
        <p className="mt-3 text-xs text-ink-soft">
          <span className="font-semibold">Basis: </span>
          {basis}
        </p>
      )}
    </section>
  );
}

/** The one number a page is for, large; an <output> named by its label, so it reads as a live result. */
export function Headline({ label, children, sub }: { label: string; children: ReactNode; sub?: ReactNode }) {
  const id = useId();
  return (
    <div>
      <p id={id} className="text-sm text-ink-soft">
        {label}
      </p>
      <output aria-labelledby={id} className="block text-2xl font-semibold text-ink sm:text-3xl">
        {children}
      </output>
      {sub && <p className="mt-1 text-sm text-ink-soft">{sub}</p>}
    </div>
  );
}

/** One labelled result; `note` says what it means or where it comes from. */
export function ResultRow({ label, children, note }: { label: ReactNode; children: ReactNode; note?: ReactNode }) {
  return (
    // A value too wide to sit beside its label goes onto the next line, right-aligned (never over the label).
    <div className="flex flex-wrap items-baseline justify-between gap-x-4 py-2">
      <dt className="min-w-[6rem] flex-1 text-sm">{label}</dt>
      <dd className="ml-auto max-w-full text-right [overflow-wrap:anywhere]">{children}</dd>
      {note && <dd className="w-full text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}

/** Shown in place of results while the inputs are incomplete or refused. */
export function NoResult({ message }: { message: string }) {
  return (
    <div role="status" className="rounded-md border border-dashed border-rule bg-paper p-3 text-sm text-ink-soft">
      <span className="font-medium text-ink">No result yet. </span>
      {message}
    </div>
  );
}

/** A calculator's cautions (with the levels crossed) and warnings, above its results; nothing when it has none. */
export function ResultNotesBlock({
  r,
}: {
  r: { warnings: readonly ResultWarning[]; cautions: readonly Caution[]; levelsCrossed?: readonly string[] };
}) {
  return (
    <>
      <SafetyNotice cautions={r.cautions} crossed={r.levelsCrossed} />
      <ResultWarnings warnings={r.warnings} />
    </>
  );
}
