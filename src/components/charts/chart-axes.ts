// Axis options for uPlot from a chart's description of an axis: its label with the unit, its domain, fixed ticks
// (used until someone zooms) and a log scale where asked. Ticks people can read: 1-2-5 steps, whole decades.
import type uPlot from 'uplot';
import { formatTick } from '@shared/format/measured-number.ts';
import { axisColor, axisLabelFont, chartColors, tickFont } from './chart-theme.ts';

export interface AxisSpec {
  /** The label with its unit, e.g. "Drive (V)". */
  label: string;
  domain: readonly [number, number];
  /** Fixed tick positions for the whole domain; computed ticks once zoomed. */
  ticks?: readonly number[];
  log?: boolean;
  format?: (v: number) => string;
  /** Hide ticks and label (a strip plot's spread axis). */
  hidden?: boolean;
}

/** A 1, 2 or 5 × 10ᵏ step near span/count [practice: the usual chart tick rule]. */
function niceStep(span: number, count: number): number {
  const raw = span / count;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
}

/** About `count` round ticks inside [lo, hi]. */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return Number.isFinite(lo) ? [lo] : [];
  const step = niceStep(hi - lo, count);
  const out: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + step * 1e-9 && out.length < 50; t += step) out.push(Number(t.toPrecision(12)));
  return out;
}

/** Ticks of a log axis inside [lo, hi]: decades, with 2 and 5 between them when fewer than three decades show. */
export function logTicks(lo: number, hi: number): number[] {
  if (!(lo > 0) || !(hi > lo)) return [];
  const out: number[] = [];
  const few = Math.log10(hi / lo) < 3;
  for (let e = Math.floor(Math.log10(lo)); e <= Math.ceil(Math.log10(hi)); e++)
    for (const m of few ? [1, 2, 5] : [1]) {
      const t = Number((m * 10 ** e).toPrecision(12));
      if (t >= lo * (1 - 1e-9) && t <= hi * (1 + 1e-9)) out.push(t);
    }
  return out.length >= 2 ? out : niceTicks(lo, hi);
}

const sameRange = (a: readonly [number, number], min: number, max: number) =>
  Math.abs(a[0] - min) <= Math.abs(a[1] - a[0]) * 1e-9 && Math.abs(a[1] - max) <= Math.abs(a[1] - a[0]) * 1e-9;

/** The ticks for the range shown: the chart's own over its whole domain, else computed. */
function splitsFor(spec: AxisSpec) {
  return (_u: uPlot, _axis: number, min: number, max: number) => {
    if (spec.ticks && sameRange(spec.domain, min, max)) return [...spec.ticks];
    return spec.log ? logTicks(min, max) : niceTicks(min, max);
  };
}

/** Width in CSS pixels that a y axis's tick figures need (12 px monospace is about 7.3 px a character). */
const yAxisSize = (_u: uPlot, values: string[] | null) => 30 + 7.3 * Math.max(3, ...(values ?? []).map((v) => v.length));

/** uPlot's scale for an axis: fixed to the domain until a zoom sets another range. */
export function scaleOf(spec: AxisSpec, zoomable: boolean): uPlot.Scale {
  return {
    auto: false,
    distr: spec.log ? 3 : 1,
    log: 10,
    range: (_u, min, max) =>
      zoomable && min != null && max != null && Number.isFinite(min) && Number.isFinite(max) && max > min
        ? [min, max]
        : [spec.domain[0], spec.domain[1]],
  };
}

/** uPlot's axis for an x (side 2, below) or y (side 3, left) axis description. */
export function axisOf(spec: AxisSpec, which: 'x' | 'y'): uPlot.Axis {
  const format = spec.format ?? formatTick;
  return {
    scale: which,
    side: which === 'x' ? 2 : 3,
    show: !spec.hidden,
    label: spec.label,
    labelFont: axisLabelFont,
    labelSize: which === 'x' ? 22 : 20,
    labelGap: 2,
    font: tickFont,
    stroke: axisColor,
    splits: splitsFor(spec),
    values: (_u, splits) => splits.map((v) => (v == null ? '' : format(v))),
    size: which === 'x' ? 28 : yAxisSize,
    gap: 4,
    grid: { show: true, stroke: chartColors.rule, width: 1, dash: [3, 3] },
    ticks: { show: true, stroke: chartColors.rule, width: 1, size: 4 },
  };
}
