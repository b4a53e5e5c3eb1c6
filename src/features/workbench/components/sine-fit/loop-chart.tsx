import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import { formatTick } from '@shared/format/measured-number.ts';
import { axisLabelStyle, chartColors, tickStyle } from '@/components/charts/chart-theme.ts';

/** One point of the loop: drive (V) and displacement (nm). */
export interface LoopPoint {
  volts: number;
  displacementNm: number;
}

const noMarker = () => <g />;

/** The recorded loop (displacement against drive, already thinned for drawing) with the fitted ellipse over it. Import lazily: recharts is large. */
export function LoopChart({ samples, ellipse }: { samples: readonly LoopPoint[]; ellipse: readonly LoopPoint[] }) {
  return (
    <ResponsiveContainer width="100%" height={300}>
      <ScatterChart margin={{ top: 4, right: 16, bottom: 24, left: 8 }}>
        <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
        <XAxis
          type="number"
          dataKey="volts"
          domain={['auto', 'auto']}
          tick={tickStyle}
          tickFormatter={formatTick}
          label={{ value: 'Drive (V)', position: 'insideBottom', offset: -14, style: axisLabelStyle }}
        />
        <YAxis
          type="number"
          dataKey="displacementNm"
          domain={['auto', 'auto']}
          width={72}
          tick={tickStyle}
          tickFormatter={formatTick}
          label={{
            value: 'Displacement (nm)',
            angle: -90,
            position: 'insideLeft',
            offset: 4,
            style: { ...axisLabelStyle, textAnchor: 'middle' },
          }}
        />
        <Legend verticalAlign="top" itemSorter={null} />
        <Scatter name="Samples" data={[...samples]} fill={chartColors.copper} fillOpacity={0.45} shape="circle" isAnimationActive={false} />
        <Scatter
          name="Fitted ellipse"
          data={[...ellipse]}
          line={{ stroke: chartColors.ink, strokeWidth: 1.5 }}
          shape={noMarker}
          legendType="line"
          fill={chartColors.ink}
          isAnimationActive={false}
        />
      </ScatterChart>
    </ResponsiveContainer>
  );
}
