import { useMemo } from 'react';
import { summarize } from '@shared/stats/quantiles.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from './chart-theme.ts';
import { logTicks, niceTicks, type AxisSpec } from './chart-axes.ts';
import { rangeText } from './chart-figures.tsx';
import type { ChartLayer } from './chart-layers.ts';
import type { LegendItem } from './chart-legend.tsx';
import { UplotChart } from './uplot-chart.tsx';

const number = (v: number) => (Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(3))));
/** Spread the dots vertically in a fixed pattern (golden-ratio steps) so equal gains stay visible. */
const jitter = (i: number) => 0.3 + ((i * 0.618034) % 1) * 0.4;
const SPREAD: AxisSpec = { label: '', domain: [0, 1], hidden: true };

/**
 * A part's accepted gains (nm/V, magnitudes) as a strip of dots over a box from the lower to the upper quartile
 * with the median, whiskers to the extremes, the candidate run as a copper diamond and the expected gain as a
 * dashed line. Switches to a log scale when values span more than ×20 (a unit slip would otherwise squash the rest).
 */
export function GainDistributionChart({
  gains,
  candidateNmPerV,
  expectedNmPerV = null,
  height = 150,
}: {
  gains: number[];
  candidateNmPerV: number;
  expectedNmPerV?: number | null;
  height?: number;
}) {
  const chart = useMemo(() => {
    const s = summarize(gains);
    const candidate = Math.abs(candidateNmPerV);
    const all = [...gains, candidate, ...(expectedNmPerV ? [expectedNmPerV] : [])].filter((v) => Number.isFinite(v) && v > 0);
    const lo = all.length ? Math.min(...all) : 1;
    const hi = all.length ? Math.max(...all) : 10;
    const log = hi / lo > 20;
    const pad = (hi - lo) * 0.12 || hi * 0.15 || 1;
    const ticks = log ? logTicks(lo / 1.5, hi * 1.5) : niceTicks(Math.max(0, lo - pad), hi + pad, 4);
    const domain: [number, number] = log
      ? [lo / 1.5, hi * 1.5]
      : [Math.min(ticks[0]!, lo - pad * 0.5), Math.max(ticks.at(-1)!, hi + pad * 0.5)];
    const x: AxisSpec = { label: `Gain (nm/V)${log ? ', log scale' : ''}`, domain, log, ticks, format: number };
    const box = s.p25 !== null && s.p75 !== null;
    const layers: ChartLayer[] = [
      ...(box
        ? [
            {
              kind: 'rect' as const,
              x: [s.p25!, s.p75!] as [number, number],
              y: [0.22, 0.78] as [number, number],
              fill: chartColors.teal,
              fillOpacity: 0.14,
              stroke: chartColors.teal,
              strokeOpacity: 0.6,
            },
          ]
        : []),
      ...(s.min !== null && s.p25 !== null
        ? [{ kind: 'line' as const, xs: [s.min, s.p25], ys: [0.5, 0.5], color: chartColors.teal, width: 1 }]
        : []),
      ...(s.max !== null && s.p75 !== null
        ? [{ kind: 'line' as const, xs: [s.p75, s.max], ys: [0.5, 0.5], color: chartColors.teal, width: 1 }]
        : []),
      ...(s.median !== null
        ? [{ kind: 'line' as const, xs: [s.median, s.median], ys: [0.16, 0.84], color: chartColors.tealDark, width: 2.5 }]
        : []),
      ...(expectedNmPerV
        ? [{ kind: 'rule' as const, axis: 'x' as const, at: expectedNmPerV, color: chartColors.ink, width: 1, dash: [5, 4] }]
        : []),
      { kind: 'points', xs: gains, ys: gains.map((_, i) => jitter(i)), color: chartColors.teal, opacity: 0.75 },
      { kind: 'points', xs: [candidate], ys: [0.5], color: chartColors.copper, outline: chartColors.ink, marker: 'diamond', radius: 5 },
    ];
    const legend: LegendItem[] = [
      ...(gains.length
        ? [{ label: 'Accepted runs', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.teal } }]
        : []),
      ...(s.n > 1
        ? [
            {
              label: 'Quartiles and median',
              swatch: { kind: 'area' as const, fill: chartColors.teal, stroke: chartColors.teal, median: chartColors.tealDark },
            },
          ]
        : []),
      { label: 'This run', swatch: { kind: 'marker', marker: 'diamond', color: chartColors.copper, outline: chartColors.ink } },
      ...(expectedNmPerV
        ? [{ label: 'Expected from geometry', swatch: { kind: 'line' as const, color: chartColors.ink, dash: true, width: 1 } }]
        : []),
    ];
    const figures = [
      { label: 'This run', value: `${formatShort(candidate)} nm/V` },
      ...(s.n > 0 ? [{ label: 'Accepted runs', value: `${s.n}, ${rangeText(gains, 'nm/V')}` }] : []),
      ...(s.median !== null ? [{ label: 'Median', value: `${formatShort(s.median)} nm/V` }] : []),
      ...(box ? [{ label: 'Quartiles', value: `${formatShort(s.p25!)} and ${formatShort(s.p75!)} nm/V` }] : []),
      ...(expectedNmPerV ? [{ label: 'Expected from geometry', value: `${formatShort(expectedNmPerV)} nm/V` }] : []),
    ];
    return { x, y: SPREAD, layers, legend, figures };
  }, [gains, candidateNmPerV, expectedNmPerV]);
  return <UplotChart {...chart} height={height} />;
}
