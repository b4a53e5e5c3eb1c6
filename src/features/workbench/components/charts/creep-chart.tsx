import { useMemo } from 'react';
import { decadeTicks } from '@/components/charts/axis-ticks.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import { niceTicks } from '@/components/charts/chart-axes.ts';
import { seriesText } from '@/components/charts/chart-figures.tsx';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

/** A sample or a point of the fitted law: time since the step (s) and displacement (nm). */
export interface CreepPoint {
  timeS: number;
  displacementNm: number;
}

const creepAxes = [
  ['time', (p: CreepPoint) => p.timeS, 's'],
  ['displacement', (p: CreepPoint) => p.displacementNm, 'nm'],
] as const;

/** Step-and-hold samples (copper) with the fitted x(0.1 s)·[1 + γ·log10(t/0.1 s)] curve (ink), time on a log axis. */
export function CreepChart({ samples, curve }: { samples: readonly CreepPoint[]; curve: readonly CreepPoint[] }) {
  const chart = useMemo(() => {
    const all = [...samples, ...curve];
    const ticks = decadeTicks(Math.min(...all.map((p) => p.timeS)), Math.max(...all.map((p) => p.timeS)));
    const ys = all.map((p) => p.displacementNm);
    const lo = Math.min(...ys);
    const hi = Math.max(...ys);
    const pad = (hi - lo) * 0.06 || Math.abs(hi) * 0.1 || 1;
    const yd: [number, number] = [lo - pad, hi + pad];
    return {
      x: { label: 'Time since the step (s)', domain: [ticks[0]!, ticks.at(-1)!] as [number, number], ticks, log: true },
      y: { label: 'Displacement (nm)', domain: yd, ticks: niceTicks(...yd) },
      layers: [
        { kind: 'points' as const, xs: samples.map((p) => p.timeS), ys: samples.map((p) => p.displacementNm), color: chartColors.copper },
        {
          kind: 'line' as const,
          xs: curve.map((p) => p.timeS),
          ys: curve.map((p) => p.displacementNm),
          color: chartColors.ink,
          width: 1.5,
        },
      ],
      legend: [
        { label: 'Samples', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.copper } },
        { label: 'Fitted creep law', swatch: { kind: 'line' as const, color: chartColors.ink } },
      ],
      figures: [
        { label: 'Samples', value: seriesText(samples, creepAxes) },
        { label: 'Fitted creep law', value: seriesText(curve, creepAxes, { count: false }) },
      ],
    };
  }, [samples, curve]);
  return <UplotChart {...chart} height={280} zoom />;
}
