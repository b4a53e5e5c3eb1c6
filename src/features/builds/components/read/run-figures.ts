import { runMethodLabels, type RunDto } from '@shared/schemas/run.ts';
import { formatFixed, formatShort, formatWithUncertainty } from '@shared/format/measured-number.ts';
import { runStatusBadge } from './format.ts';
import { formatDate } from '@shared/format/dates.ts';

/** A run's figures as the table and the phone cards print them: gain ± half the 95 % interval, R² to 4 places, %FS to 1. */
export function runFigures(run: RunDto) {
  const { fit } = run;
  const [lo, hi] = fit.gainCi95NmPerV;
  return {
    date: formatDate(run.createdAt),
    gain: formatWithUncertainty(fit.gainNmPerV, (hi - lo) / 2),
    r2: formatFixed(fit.r2, 4),
    residualNm: formatShort(fit.residualStdNm, 2),
    nonlinearityPct: formatFixed(fit.nonlinearityPctFs, 1),
    hysteresisPct: formatFixed(fit.hysteresisPctFs, 1),
    n: String(fit.n),
    method: runMethodLabels[run.method],
    badge: runStatusBadge[run.status],
  };
}
