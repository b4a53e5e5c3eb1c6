// A calibration run named the way a person recognises it, for audit entries and decision mails:
// "X bender · run of 12 Nov 2026 · 102.7 ± 0.4 nm/V (95 %)". The gain prints through the one number
// formatter (GUM 7.2.6 rounding) and says which ± it carries, as every page does.
import { formatDate } from '../format/dates.ts';
import { formatPlusMinus } from '../format/measured-number.ts';
import { runGainPlusMinus } from '../export/run-figures.ts';

export interface RunNameFacts {
  actuatorLabel: string | null;
  partName: string;
  /** YYYY-MM-DD as the maker gave it, else null (the creation date stands in). */
  measuredOn: string | null;
  createdAt: Date;
  gainNmPerV: number;
  gainCi95NmPerV: readonly [number | null, number | null] | null;
  gainStdUncertaintyNmPerV: number | null;
}

/** "<actuator label or part name> · run of <date> · <gain> ± <u> nm/V (<which ±>)". */
export function runName(f: RunNameFacts): string {
  const label = f.actuatorLabel?.trim() || f.partName;
  const date = formatDate(f.measuredOn ?? f.createdAt.toISOString());
  const pm = runGainPlusMinus(f);
  return `${label} · run of ${date} · ${formatPlusMinus(f.gainNmPerV, pm.halfWidth, pm.kind)}`;
}
