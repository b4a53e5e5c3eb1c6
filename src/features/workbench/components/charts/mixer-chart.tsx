import { useMemo } from 'react';
import { niceStep, stepTicks } from './axis-ticks.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import type { ChartLayer } from '@/components/charts/chart-layers.ts';
import type { LegendItem } from '@/components/charts/chart-legend.tsx';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

/** A point of the tip plane in nm. */
export interface PlanePoint {
  xNm: number;
  yNm: number;
}

/** Equal spans on both axes with 1-2-5 ticks, so the parallelogram keeps its true shape. */
function squareAxes(points: readonly PlanePoint[]): { x: number[]; y: number[] } {
  const xs = points.map((p) => p.xNm);
  const ys = points.map((p) => p.yNm);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1;
  const step = niceStep(span / 6);
  const snap = (lo: number, hi: number) => [Math.floor((lo - span * 0.04) / step), Math.ceil((hi + span * 0.04) / step)];
  const [x0, x1] = snap(Math.min(...xs), Math.max(...xs));
  const [y0, y1] = snap(Math.min(...ys), Math.max(...ys));
  const n = Math.max(x1 - x0, y1 - y0);
  const xLo = x0 - Math.floor((n - (x1 - x0)) / 2);
  const yLo = y0 - Math.floor((n - (y1 - y0)) / 2);
  return { x: stepTicks(xLo * step, (xLo + n) * step, step), y: stepTicks(yLo * step, (yLo + n) * step, step) };
}

const cornersText = (ps: readonly PlanePoint[]) => ps.map((p) => `(${formatShort(p.xNm)}, ${formatShort(p.yNm)})`).join(', ') + ' nm';

/** Reachable region (teal parallelogram) with the wanted point: copper dot if reachable, red cross if not. */
export function MixerChart({ region, target }: { region: readonly PlanePoint[]; target: (PlanePoint & { reachable: boolean }) | null }) {
  const chart = useMemo(() => {
    const axes = squareAxes([...region, { xNm: 0, yNm: 0 }, ...(target ? [target] : [])]);
    const wanted = target ? (target.reachable ? 'Wanted point (reachable)' : 'Wanted point (out of reach)') : '';
    const marker = target?.reachable ? ('circle' as const) : ('cross' as const);
    const color = target?.reachable ? chartColors.copper : chartColors.danger;
    const layers: ChartLayer[] = [
      {
        kind: 'polygon',
        xs: region.map((p) => p.xNm),
        ys: region.map((p) => p.yNm),
        fill: chartColors.teal,
        fillOpacity: 0.12,
        stroke: chartColors.teal,
        width: 1.5,
      },
      { kind: 'points', xs: [0], ys: [0], color: chartColors.ink, radius: 3 },
      ...(target ? [{ kind: 'points' as const, xs: [target.xNm], ys: [target.yNm], color, marker, radius: 5 }] : []),
    ];
    const legend: LegendItem[] = [
      { label: 'Reachable region', swatch: { kind: 'area', fill: chartColors.teal, stroke: chartColors.teal } },
      { label: 'Rest position (0, 0)', swatch: { kind: 'marker', marker: 'circle', color: chartColors.ink } },
      ...(target ? [{ label: wanted, swatch: { kind: 'marker' as const, marker, color } }] : []),
    ];
    return {
      x: { label: 'x (nm)', domain: [axes.x[0]!, axes.x.at(-1)!] as [number, number], ticks: axes.x },
      y: { label: 'y (nm)', domain: [axes.y[0]!, axes.y.at(-1)!] as [number, number], ticks: axes.y },
      layers,
      legend,
      figures: [
        { label: 'Reachable region, corners', value: cornersText(region) },
        ...(target
          ? [{ label: target.reachable ? 'Wanted point, reachable' : 'Wanted point, out of reach', value: cornersText([target]) }]
          : []),
      ],
    };
  }, [region, target]);
  return <UplotChart {...chart} height={420} square />;
}
