// The figures of a run as every page prints them (the one number formatter, GUM 7.2.6 rounding), and
// the same figures as plain ASCII columns for files, so an export is rounded exactly as the page.
import type { RunDto } from '../schemas/run.ts';
import { formatFixed, formatShort, formatSig, formatWithUncertainty, plainFigure, type PlusMinusKind } from '../format/measured-number.ts';

/** The ± a run's gain carries and what it is: a 95 % interval half-width (point runs) or a standard uncertainty. */
export function runGainPlusMinus(fit: {
  gainCi95NmPerV: readonly [number | null, number | null] | null;
  gainStdUncertaintyNmPerV?: number | null;
}): { halfWidth: number | null; kind: PlusMinusKind } {
  const [lo, hi] = fit.gainCi95NmPerV ?? [null, null];
  if (lo !== null && hi !== null)
    return { halfWidth: Number.isFinite(lo) && Number.isFinite(hi) ? Math.abs(hi - lo) / 2 : null, kind: 'ci95' };
  const u = fit.gainStdUncertaintyNmPerV;
  return { halfWidth: typeof u === 'number' && Number.isFinite(u) ? u : null, kind: 'std' };
}

/** A run's printed figures: gain ± (and which ±), R² to 4 places, % of span to 1, worst-case bounds, sine figures. */
export function runPrintedFigures(run: Pick<RunDto, 'fit'>) {
  const { fit } = run;
  const pm = runGainPlusMinus(fit);
  return {
    gain: formatWithUncertainty(fit.gainNmPerV, pm.halfWidth),
    plusMinusKind: pm.kind,
    r2: formatFixed(fit.r2, 4),
    residualNm: formatShort(fit.residualStdNm, 2),
    nonlinearityPct: formatFixed(fit.nonlinearityPctFs, 1),
    hysteresisPct: formatFixed(fit.hysteresisPctFs, 1),
    boundsNmPerV: fit.gainBoundsNmPerV ? ([formatSig(fit.gainBoundsNmPerV[0]), formatSig(fit.gainBoundsNmPerV[1])] as const) : null,
    spanNm: formatSig(fit.spanNm),
    frequencyHz: fit.sine ? formatSig(fit.sine.frequencyHz) : null,
    phaseLagDeg: fit.sine ? formatFixed(fit.sine.phaseLagDeg, 1) : null,
  };
}

/** Column names of `runFigureRow`, in order. */
export const RUN_FIGURE_COLUMNS = [
  'run_id',
  'kind',
  'method',
  'status',
  'measured_on',
  'points',
  'gain_nm_per_v',
  'gain_plus_minus_nm_per_v',
  'plus_minus_is',
  'gain_worst_case_low_nm_per_v',
  'gain_worst_case_high_nm_per_v',
  'r2',
  'residual_sd_nm',
  'nonlinearity_pct_of_span',
  'hysteresis_pct_of_span',
  'span_nm',
  'sine_frequency_hz',
  'phase_lag_deg',
  'voltage_unit',
  'displacement_unit',
] as const;

/** One run's figures in RUN_FIGURE_COLUMNS order, rounded as its page shows them, as plain ASCII numbers. */
export function runFigureRow(run: RunDto): string[] {
  const f = runPrintedFigures(run);
  const plain = (s: string | null | undefined) => (s ? plainFigure(s) : '');
  return [
    String(run.id),
    run.kind,
    run.method,
    run.status,
    run.measuredOn ?? '',
    String(run.pointCount),
    plain(f.gain.value),
    plain(f.gain.uncertainty),
    f.gain.uncertainty === null ? '' : f.plusMinusKind === 'ci95' ? '95 % interval half-width' : 'standard uncertainty (k = 1)',
    plain(f.boundsNmPerV?.[0]),
    plain(f.boundsNmPerV?.[1]),
    plain(f.r2),
    plain(f.residualNm),
    plain(f.nonlinearityPct),
    plain(f.hysteresisPct),
    plain(f.spanNm),
    plain(f.frequencyHz),
    plain(f.phaseLagDeg),
    run.voltageUnit,
    run.displacementUnit,
  ];
}
