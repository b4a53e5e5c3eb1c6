import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import { decadeTicks } from './axis-ticks.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, legendStyle, numberTicks, tickStyle, xAxisLabel, yAxisLabel } from '@/components/charts/chart-theme.ts';
import { ChartFigures } from '@/components/charts/chart-figures.tsx';

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
  const current = steps.find((s) => s.bits === bits);
  const ys = [...steps.map((s) => s.lsbNm), ...(wantedStepNm ? [wantedStepNm] : []), ...(pixelNm ? [pixelNm] : [])];
  const ticks = decadeTicks(Math.min(...ys), Math.max(...ys));
  return (
    <div>
      <ResponsiveContainer width="100%" height={280}>
        <LineChart data={[...steps]} margin={{ top: 4, right: 24, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis
            type="number"
            dataKey="bits"
            domain={['dataMin', 'dataMax']}
            allowDecimals={false}
            tick={tickStyle}
            label={xAxisLabel('DAC bits')}
          />
          <YAxis
            type="number"
            scale="log"
            domain={[ticks[0], ticks[ticks.length - 1]]}
            ticks={ticks}
            allowDataOverflow
            width={72}
            {...numberTicks}
            label={yAxisLabel('Step (nm)')}
          />
          <Legend verticalAlign="top" wrapperStyle={legendStyle} />
          <Line name="LSB step" dataKey="lsbNm" stroke={chartColors.teal} strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
          {wantedStepNm !== undefined && (
            <ReferenceLine
              y={wantedStepNm}
              stroke={chartColors.amber}
              strokeDasharray="5 4"
              label={{ value: 'wanted step', position: 'insideTopRight', fontSize: 11, fill: chartColors.inkSoft }}
            />
          )}
          {pixelNm !== undefined && (
            <ReferenceLine
              y={pixelNm}
              stroke={chartColors.inkSoft}
              strokeDasharray="2 3"
              label={{ value: 'pixel size', position: 'insideBottomRight', fontSize: 11, fill: chartColors.inkSoft }}
            />
          )}
          {current && <ReferenceDot x={current.bits} y={current.lsbNm} r={6} fill={chartColors.copper} stroke="white" strokeWidth={2} />}
        </LineChart>
      </ResponsiveContainer>
      <ChartFigures
        figures={[
          { label: 'LSB step', value: steps.map((s) => `${s.bits} bit: ${formatShort(s.lsbNm)} nm`).join('; ') },
          ...(current ? [{ label: 'Chosen DAC', value: `${current.bits} bit, ${formatShort(current.lsbNm)} nm` }] : []),
          ...(wantedStepNm !== undefined ? [{ label: 'Wanted step', value: `${formatShort(wantedStepNm)} nm` }] : []),
          ...(pixelNm !== undefined ? [{ label: 'Pixel size', value: `${formatShort(pixelNm)} nm` }] : []),
        ]}
      />
    </div>
  );
}
