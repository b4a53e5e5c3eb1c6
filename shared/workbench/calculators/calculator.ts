// The shape every workbench calculator shares: the API's input schema, and the one function that
// composes the whole result a page shows (headline and derived figures, warnings, cautions). The
// server's POST /api/workbench/<slug> and the page's live preview both call `compute`, so they
// cannot differ.
import type { z } from 'zod';
import type { Caution } from '../safety.ts';

/** A note on a result: a validity limit crossed, or a figure that carries little information. */
export interface ResultWarning {
  code: string;
  message: string;
}

/** What every calculator's result carries besides its figures. */
export interface ResultNotes {
  warnings: ResultWarning[];
  cautions: Caution[];
}

/** One calculator: URL slug, input schema (SI or stated units), and the composing function. */
export interface Calculator<S extends z.ZodType, R extends ResultNotes> {
  slug: string;
  input: S;
  compute: (input: z.output<S>) => R;
}

/** Declares a calculator; the identity function that lets TypeScript infer the schema and result types. */
export function defineCalculator<S extends z.ZodType, R extends ResultNotes>(c: Calculator<S, R>): Calculator<S, R> {
  return c;
}

/** The result type of a calculator. */
export type CalculatorResult<C> = C extends Calculator<z.ZodType, infer R> ? R : never;
