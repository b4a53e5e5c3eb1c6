import { useMemo } from 'react';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from './chart-theme.ts';
import { logTicks, niceTicks, type AxisSpec } from './chart-axes.ts';
import type { ChartLayer } from './chart-layers.ts';
import type { LegendItem } from './chart-legend.tsx';
import { UplotChart } from './uplot-chart.tsx';

/** One accepted run as the strip plot shows it. */
export interface PartRunsChartRun {
  id: number;
  gainNmPerV: number;
  buildTitle: string;
  maker: string;
  method: string;
}

const fmt = (v: number) => (Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(3))));
/** Fixed vertical spread (golden-ratio steps) so runs of equal gain stay visible side by side. */
const jitter = (i: number) => 0.25 + ((i * 0.618034) % 1) * 0.5;
const SPREAD: AxisSpec = { label: '', domain: [0, 1], hidden: true };

/**
 * Every accepted run of a part as one dot on a gain axis (log when the values span more than ×20), over the
 * interquartile box with the median, and the expected gain from geometry as a dashed line in an amber band.
 * Hover a dot for its build, maker and method; the figures under the chart list them all.
 */
export function PartRunsChart({
  runs,
  median,
  p25,
  p75,
  expected,
  height = 170,
}: {
  runs: PartRunsChartRun[];
  median: number | null;
  p25: number | null;
  p75: number | null;
  expected: { gainNmPerV: number; lowNmPerV: number; highNmPerV: number } | null;
  height?: number;
}) {
  const chart = useMemo(() => {
    const values = [...runs.map((r) => r.gainNmPerV), ...(expected ? [expected.lowNmPerV, expected.highNmPerV] : [])].filter(
      (v) => Number.isFinite(v) && v > 0,
    );
    const lo = values.length ? Math.min(...values) : 1;
    const hi = values.length ? Math.max(...values) : 10;
    const log = hi / lo > 20;
    const pad = (hi - lo) * 0.05 || hi * 0.1 || 1;
    const linear = niceTicks(Math.max(0, lo - pad), hi + pad);
    const domain: [number, number] = log ? [lo / 1.5, hi * 1.5] : [Math.min(linear[0]!, lo - pad), Math.max(linear.at(-1)!, hi + pad)];
    const x: AxisSpec = {
      label: `Gain (nm/V)${log ? ', log scale' : ''}`,
      domain,
      log,
      ticks: log ? logTicks(...domain) : linear.filter((t) => t >= domain[0] && t <= domain[1]),
      format: fmt,
    };
    const quartiles = p25 !== null && p75 !== null && runs.length > 1;
    const layers: ChartLayer[] = [
      ...(expected
        ? [
            {
              kind: 'rect' as const,
              x: [expected.lowNmPerV, expected.highNmPerV] as [number, number],
              y: [0, 1] as [number, number],
              fill: chartColors.amber,
              fillOpacity: 0.1,
            },
            { kind: 'rule' as const, axis: 'x' as const, at: expected.gainNmPerV, color: chartColors.amber, width: 1.5, dash: [6, 4] },
          ]
        : []),
      ...(quartiles
        ? [
            {
              kind: 'rect' as const,
              x: [p25, p75] as [number, number],
              y: [0.15, 0.85] as [number, number],
              fill: chartColors.teal,
              fillOpacity: 0.12,
              stroke: chartColors.teal,
              strokeOpacity: 0.6,
            },
          ]
        : []),
      ...(median !== null
        ? [{ kind: 'line' as const, xs: [median, median], ys: [0.08, 0.92], color: chartColors.tealDark, width: 2.5 }]
        : []),
      {
        kind: 'points',
        xs: runs.map((r) => r.gainNmPerV),
        ys: runs.map((_, i) => jitter(i)),
        color: chartColors.copper,
        opacity: 0.85,
        outline: '#fff',
        radius: 4.5,
        tips: runs.map((r) => `${fmt(r.gainNmPerV)} nm/V\n${r.buildTitle}\nby ${r.maker} · ${r.method}`),
      },
    ];
    const legend: LegendItem[] = [
      { label: 'Accepted run', swatch: { kind: 'marker', marker: 'circle', color: chartColors.copper } },
      ...(quartiles
        ? [
            {
              label: 'Median and middle half (IQR)',
              swatch: { kind: 'area' as const, fill: chartColors.teal, stroke: chartColors.teal, median: chartColors.tealDark },
            },
          ]
        : []),
      ...(expected
        ? [
            {
              label: 'Expected from geometry, with its material band',
              swatch: { kind: 'line' as const, color: chartColors.amber, dash: true },
            },
          ]
        : []),
    ];
    const figures = [
      {
        label: 'Accepted runs',
        value: runs.length === 0 ? 'none' : runs.map((r) => `${formatShort(r.gainNmPerV)} nm/V (${r.buildTitle}, ${r.maker})`).join('; '),
      },
      ...(median !== null ? [{ label: 'Median', value: `${formatShort(median)} nm/V` }] : []),
      ...(quartiles ? [{ label: 'Quartiles', value: `${formatShort(p25)} and ${formatShort(p75)} nm/V` }] : []),
      ...(expected
        ? [
            {
              label: 'Expected from geometry',
              value: `${formatShort(expected.gainNmPerV)} nm/V (band ${formatShort(expected.lowNmPerV)} to ${formatShort(expected.highNmPerV)} nm/V)`,
            },
          ]
        : []),
    ];
    return { x, y: SPREAD, layers, legend, figures };
  }, [runs, median, p25, p75, expected]);
  return <UplotChart {...chart} height={height} />;
}
