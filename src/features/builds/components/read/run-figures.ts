import { type RunDto } from '@shared/schemas/run.ts';
import { runMethodLabels, runKindLabels } from '@shared/schemas/run-vocabulary.ts';
import { runPrintedFigures } from '@shared/export/run-figures.ts';
import { runStatusBadge } from './format.ts';
import { formatDate } from '@shared/format/dates.ts';

/** A run's figures as the table and the phone cards print them (the same rounding as the export). */
export function runFigures(run: RunDto) {
  return {
    ...runPrintedFigures(run),
    date: formatDate(run.measuredOn ?? run.createdAt),
    n: String(run.fit.n),
    kind: runKindLabels[run.kind],
    method: runMethodLabels[run.method],
    badge: runStatusBadge[run.status],
  };
}
