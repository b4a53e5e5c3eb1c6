import { useMemo } from 'react';
import { planePointsText, squareAxes, tickDomain, type PlanePoint } from '@/components/charts/plane-axes.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import type { ChartLayer } from '@/components/charts/chart-layers.ts';
import type { LegendItem } from '@/components/charts/chart-legend.tsx';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

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
      x: { label: 'x (nm)', domain: tickDomain(axes.x), ticks: axes.x },
      y: { label: 'y (nm)', domain: tickDomain(axes.y), ticks: axes.y },
      layers,
      legend,
      figures: [
        { label: 'Reachable region, corners', value: planePointsText(region) },
        ...(target
          ? [{ label: target.reachable ? 'Wanted point, reachable' : 'Wanted point, out of reach', value: planePointsText([target]) }]
          : []),
      ],
    };
  }, [region, target]);
  return <UplotChart {...chart} height={420} square />;
}
