import { useMemo } from 'react';
import { chartColors } from '@/components/charts/chart-theme.ts';
import { niceTicks } from '@/components/charts/chart-axes.ts';
import { seriesText } from '@/components/charts/chart-figures.tsx';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

/** One point of the loop: drive (V) and displacement (nm). */
export interface LoopPoint {
  volts: number;
  displacementNm: number;
}

const loopAxes = [
  ['drive', (p: LoopPoint) => p.volts, 'V'],
  ['displacement', (p: LoopPoint) => p.displacementNm, 'nm'],
] as const;

/** [min, max] of some values widened by 5 % each side. */
function paddedExtent(values: readonly number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values)
    if (Number.isFinite(v)) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  if (lo > hi) return [0, 1];
  const pad = (hi - lo) * 0.05 || Math.abs(hi) * 0.1 || 1;
  return [lo - pad, hi + pad];
}

/** The recorded loop (displacement against drive) with the fitted ellipse over it; drag to zoom into the drive. */
export function LoopChart({ samples, ellipse }: { samples: readonly LoopPoint[]; ellipse: readonly LoopPoint[] }) {
  const chart = useMemo(() => {
    const all = [...samples, ...ellipse];
    const xd = paddedExtent(all.map((p) => p.volts));
    const yd = paddedExtent(all.map((p) => p.displacementNm));
    return {
      x: { label: 'Drive (V)', domain: xd, ticks: niceTicks(...xd) },
      y: { label: 'Displacement (nm)', domain: yd, ticks: niceTicks(...yd) },
      layers: [
        {
          kind: 'points' as const,
          xs: samples.map((p) => p.volts),
          ys: samples.map((p) => p.displacementNm),
          color: chartColors.copper,
          opacity: 0.45,
        },
        {
          kind: 'line' as const,
          xs: ellipse.map((p) => p.volts),
          ys: ellipse.map((p) => p.displacementNm),
          color: chartColors.ink,
          width: 1.5,
        },
      ],
      legend: [
        { label: 'Samples', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.copper, opacity: 0.6 } },
        { label: 'Fitted ellipse', swatch: { kind: 'line' as const, color: chartColors.ink } },
      ],
      figures: [
        { label: 'Samples drawn', value: seriesText(samples, loopAxes) },
        { label: 'Fitted ellipse', value: seriesText(ellipse, loopAxes, { count: false }) },
      ],
    };
  }, [samples, ellipse]);
  return <UplotChart {...chart} height={300} zoom />;
}
