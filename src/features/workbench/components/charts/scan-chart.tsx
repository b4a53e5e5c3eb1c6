import { useMemo } from 'react';
import { decadeTicks } from '@/components/charts/axis-ticks.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import { niceTicks } from '@/components/charts/chart-axes.ts';
import type { ChartLayer } from '@/components/charts/chart-layers.ts';
import type { LegendItem } from '@/components/charts/chart-legend.tsx';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

/** Smallest step at one DAC resolution. */
export interface StepAtBits {
  bits: number;
  lsbNm: number;
}

/** LSB step (log scale) against DAC bits, the chosen DAC marked; wanted step and pixel size as lines. */
export function ScanChart({
  steps,
  bits,
  wantedStepNm,
  pixelNm,
}: {
  steps: readonly StepAtBits[];
  bits: number;
  wantedStepNm?: number;
  pixelNm?: number;
}) {
  const chart = useMemo(() => {
    const current = steps.find((s) => s.bits === bits);
    const ys = [...steps.map((s) => s.lsbNm), ...(wantedStepNm ? [wantedStepNm] : []), ...(pixelNm ? [pixelNm] : [])];
    const ticks = decadeTicks(Math.min(...ys), Math.max(...ys));
    const bitsAll = steps.map((s) => s.bits);
    const xd: [number, number] = [Math.min(...bitsAll), Math.max(...bitsAll)];
    const xs = steps.map((s) => s.bits);
    const lsb = steps.map((s) => s.lsbNm);
    const layers: ChartLayer[] = [
      ...(wantedStepNm !== undefined
        ? [
            {
              kind: 'rule' as const,
              axis: 'y' as const,
              at: wantedStepNm,
              color: chartColors.amber,
              width: 1,
              dash: [5, 4],
              label: { text: 'wanted step' },
            },
          ]
        : []),
      ...(pixelNm !== undefined
        ? [
            {
              kind: 'rule' as const,
              axis: 'y' as const,
              at: pixelNm,
              color: chartColors.inkSoft,
              width: 1,
              dash: [2, 3],
              label: { text: 'pixel size', below: true },
            },
          ]
        : []),
      { kind: 'line', xs, ys: lsb, color: chartColors.teal, width: 2 },
      { kind: 'points', xs, ys: lsb, color: chartColors.teal, radius: 2 },
      ...(current
        ? [{ kind: 'points' as const, xs: [current.bits], ys: [current.lsbNm], color: chartColors.copper, outline: '#fff', radius: 6 }]
        : []),
    ];
    const legend: LegendItem[] = [
      { label: 'LSB step', swatch: { kind: 'line', color: chartColors.teal, width: 2 } },
      ...(current
        ? [{ label: 'Chosen DAC', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.copper } }]
        : []),
      ...(wantedStepNm !== undefined
        ? [{ label: 'Wanted step', swatch: { kind: 'line' as const, color: chartColors.amber, dash: true } }]
        : []),
      ...(pixelNm !== undefined
        ? [{ label: 'Pixel size', swatch: { kind: 'line' as const, color: chartColors.inkSoft, dash: true } }]
        : []),
    ];
    return {
      x: {
        label: 'DAC bits',
        domain: xd,
        ticks: niceTicks(...xd).filter(Number.isInteger),
        format: (v: number) => String(v),
      },
      y: { label: 'Step (nm)', domain: [ticks[0]!, ticks.at(-1)!] as [number, number], ticks, log: true },
      layers,
      legend,
      figures: [
        { label: 'LSB step', value: steps.map((s) => `${s.bits} bit: ${formatShort(s.lsbNm)} nm`).join('; ') },
        ...(current ? [{ label: 'Chosen DAC', value: `${current.bits} bit, ${formatShort(current.lsbNm)} nm` }] : []),
        ...(wantedStepNm !== undefined ? [{ label: 'Wanted step', value: `${formatShort(wantedStepNm)} nm` }] : []),
        ...(pixelNm !== undefined ? [{ label: 'Pixel size', value: `${formatShort(pixelNm)} nm` }] : []),
      ],
    };
  }, [steps, bits, wantedStepNm, pixelNm]);
  return <UplotChart {...chart} height={280} zoom />;
}
