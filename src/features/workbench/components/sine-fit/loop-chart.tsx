import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import { chartColors, legendStyle, numberTicks, xAxisLabel, yAxisLabel } from '@/components/charts/chart-theme.ts';
import { ChartFigures, seriesText } from '@/components/charts/chart-figures.tsx';

/** One point of the loop: drive (V) and displacement (nm). */
export interface LoopPoint {
  volts: number;
  displacementNm: number;
}

const noMarker = () => <g />;
const loopAxes = [
  ['drive', (p: LoopPoint) => p.volts, 'V'],
  ['displacement', (p: LoopPoint) => p.displacementNm, 'nm'],
] as const;

/** The recorded loop (displacement against drive, already thinned for drawing) with the fitted ellipse over it. Import lazily: recharts is large. */
export function LoopChart({ samples, ellipse }: { samples: readonly LoopPoint[]; ellipse: readonly LoopPoint[] }) {
  return (
    <div>
      <ResponsiveContainer width="100%" height={300}>
        <ScatterChart margin={{ top: 4, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis type="number" dataKey="volts" domain={['auto', 'auto']} {...numberTicks} label={xAxisLabel('Drive (V)')} />
          <YAxis
            type="number"
            dataKey="displacementNm"
            domain={['auto', 'auto']}
            width={72}
            {...numberTicks}
            label={yAxisLabel('Displacement (nm)')}
          />
          <Legend verticalAlign="top" itemSorter={null} wrapperStyle={legendStyle} />
          <Scatter
            name="Samples"
            data={[...samples]}
            fill={chartColors.copper}
            fillOpacity={0.45}
            shape="circle"
            isAnimationActive={false}
          />
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
      <ChartFigures
        figures={[
          { label: 'Samples drawn', value: seriesText(samples, loopAxes) },
          { label: 'Fitted ellipse', value: seriesText(ellipse, loopAxes, { count: false }) },
        ]}
      />
    </div>
  );
}
