import { useMemo } from 'react';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from './chart-theme.ts';
import { niceTicks, type AxisSpec } from './chart-axes.ts';
import { seriesText, type ChartFigure } from './chart-figures.tsx';
import type { ChartLayer } from './chart-layers.ts';
import type { LegendItem } from './chart-legend.tsx';
import { UplotChart } from './uplot-chart.tsx';

/** One calibration point already in volts and nanometres. */
export interface CalibrationChartPoint {
  volts: number;
  displacementNm: number;
  sweep?: 'up' | 'down';
}

/** The extremes of some values, NaN for none (a loop, not a spread, so 100 000 values stay off the call stack). */
function extent(values: Iterable<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? [lo, hi] : [NaN, NaN];
}

/** [lo, hi] widened by 4 % each side (or by 10 % of the value for a single one). */
function padded([lo, hi]: [number, number]): [number, number] {
  if (!Number.isFinite(lo)) return [0, 1];
  const pad = (hi - lo) * 0.04 || Math.abs(hi) * 0.1 || 1;
  return [lo - pad, hi + pad];
}

function columns(points: readonly CalibrationChartPoint[]) {
  const xs = new Float64Array(points.length);
  const ys = new Float64Array(points.length);
  points.forEach((p, i) => {
    xs[i] = p.volts;
    ys[i] = p.displacementNm;
  });
  return { xs, ys };
}

const axes = [
  ['drive', (p: CalibrationChartPoint) => p.volts, 'V'],
  ['displacement', (p: CalibrationChartPoint) => p.displacementNm, 'nm'],
] as const;

/**
 * Displacement against drive voltage: up sweep as copper circles, down sweep as teal triangles (each joined faintly
 * in recorded order so the hysteresis loop shows), unswept points in ink, and the fitted line across the measured
 * range. Every point is drawn (one square per pixel above 2 000); drag to zoom into a stretch of the drive.
 */
export function CalibrationChart({
  points,
  fit,
  height = 300,
}: {
  points: readonly CalibrationChartPoint[];
  fit: { interceptNm: number; gainNmPerV: number } | null;
  height?: number;
}) {
  const chart = useMemo(() => {
    const up = points.filter((p) => p.sweep === 'up');
    const down = points.filter((p) => p.sweep === 'down');
    const plain = points.filter((p) => p.sweep !== 'up' && p.sweep !== 'down');
    const [vMin, vMax] = extent(points.map((p) => p.volts));
    const line = fit && points.length > 1 && vMax > vMin ? ([vMin, vMax] as const) : null;
    const lineYs = line && fit ? line.map((v) => fit.interceptNm + fit.gainNmPerV * v) : [];
    const xDomain = padded([vMin, vMax]);
    const yDomain = padded(extent([...points.map((p) => p.displacementNm), ...lineYs]));
    const x: AxisSpec = { label: 'Drive (V)', domain: xDomain, ticks: niceTicks(...xDomain) };
    const y: AxisSpec = { label: 'Displacement (nm)', domain: yDomain, ticks: niceTicks(...yDomain) };
    const layers: ChartLayer[] = [
      ...(line ? [{ kind: 'line' as const, xs: line, ys: lineYs, color: chartColors.ink, width: 1.5 }] : []),
      ...(up.length
        ? [{ kind: 'points' as const, ...columns(up), color: chartColors.copper, marker: 'circle' as const, join: { opacity: 0.35 } }]
        : []),
      ...(down.length
        ? [{ kind: 'points' as const, ...columns(down), color: chartColors.teal, marker: 'triangle' as const, join: { opacity: 0.35 } }]
        : []),
      ...(plain.length ? [{ kind: 'points' as const, ...columns(plain), color: chartColors.ink, marker: 'circle' as const }] : []),
    ];
    const legend: LegendItem[] = [
      ...(up.length
        ? [{ label: 'Up sweep', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.copper } }]
        : []),
      ...(down.length
        ? [{ label: 'Down sweep', swatch: { kind: 'marker' as const, marker: 'triangle' as const, color: chartColors.teal } }]
        : []),
      ...(plain.length
        ? [{ label: 'Points', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.ink } }]
        : []),
      ...(line ? [{ label: 'Fitted line', swatch: { kind: 'line' as const, color: chartColors.ink } }] : []),
    ];
    const figures: ChartFigure[] = [
      ...(
        [
          ['Up sweep', up],
          ['Down sweep', down],
          ['Points', plain],
        ] as const
      )
        .filter(([, ps]) => ps.length > 0)
        .map(([label, ps]) => ({ label, value: seriesText(ps, axes) })),
      ...(fit && line
        ? [{ label: 'Fitted gain', value: `${formatShort(fit.gainNmPerV, 4)} nm/V, intercept ${formatShort(fit.interceptNm)} nm` }]
        : []),
    ];
    return { x, y, layers, legend, figures };
  }, [points, fit]);

  return <UplotChart {...chart} height={height} zoom />;
}
