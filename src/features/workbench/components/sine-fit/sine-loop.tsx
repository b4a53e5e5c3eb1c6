import { useMemo } from 'react';
import { toNm, toVolts } from '@shared/units.ts';
import { sineLoopEllipse } from '@shared/workbench/sine-fit.ts';
import { ChartFrame } from '@/features/workbench/components/chart-frame.tsx';
import { LazyLoopChart } from './lazy-loop-chart.ts';
import type { SineFitResult } from './use-sine-record.ts';
import type { SineFitInput } from '@shared/schemas/sine-fit.ts';

/** Most samples drawn; longer records are thinned evenly for the plot only (the fit uses every sample). */
const MAX_DRAWN = 2000;

/** The loop plot: the record (thinned to ≤ 2000 points, in V and nm) and the fitted ellipse. */
export function SineLoop({ input, result }: { input: SineFitInput; result: SineFitResult }) {
  const points = useMemo(() => {
    const { samples, voltageUnit, displacementUnit } = input;
    const stride = Math.max(1, samples.length / MAX_DRAWN);
    const count = Math.min(samples.length, MAX_DRAWN);
    return Array.from({ length: count }, (_, i) => {
      const s = samples[Math.floor(i * stride)];
      return { volts: toVolts(s.volts, voltageUnit), displacementNm: toNm(s.displacement, displacementUnit) };
    });
  }, [input]);
  const ellipse = useMemo(() => sineLoopEllipse(result), [result]);
  const drawn =
    points.length < input.samples.length
      ? `${points.length} of ${input.samples.length} samples, thinned evenly for drawing`
      : 'the samples';
  const caption = `Copper: ${drawn}; ink: the fitted ellipse. Its width is the phase lag.`;
  return (
    <ChartFrame label="Loop: displacement against drive" caption={caption}>
      <LazyLoopChart samples={points} ellipse={ellipse} />
    </ChartFrame>
  );
}
