import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import { decadeTicks } from './axis-ticks.ts';
import { chartColors, legendStyle, numberTicks, xAxisLabel, yAxisLabel } from '@/components/charts/chart-theme.ts';
import { ChartFigures, seriesText } from '@/components/charts/chart-figures.tsx';

/** A sample or a point of the fitted law: time since the step (s) and displacement (nm). */
export interface CreepPoint {
  timeS: number;
  displacementNm: number;
}

const noMarker = () => <g />;
const creepAxes = [
  ['time', (p: CreepPoint) => p.timeS, 's'],
  ['displacement', (p: CreepPoint) => p.displacementNm, 'nm'],
] as const;

/** Step-and-hold samples (copper) with the fitted x(0.1 s)·[1 + γ·log10(t/0.1 s)] curve (ink), time on a log axis. */
export function CreepChart({ samples, curve }: { samples: readonly CreepPoint[]; curve: readonly CreepPoint[] }) {
  const times = [...samples, ...curve].map((p) => p.timeS);
  const ticks = decadeTicks(Math.min(...times), Math.max(...times));
  return (
    <div>
      <ResponsiveContainer width="100%" height={280}>
        <ScatterChart margin={{ top: 4, right: 24, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis
            type="number"
            dataKey="timeS"
            scale="log"
            domain={[ticks[0], ticks[ticks.length - 1]]}
            ticks={ticks}
            {...numberTicks}
            label={xAxisLabel('Time since the step (s)')}
          />
          <YAxis
            type="number"
            dataKey="displacementNm"
            domain={['auto', 'auto']}
            width={72}
            {...numberTicks}
            label={yAxisLabel('Displacement (nm)')}
          />
          <Legend verticalAlign="top" itemSorter={null} wrapperStyle={legendStyle} />
          <Scatter name="Samples" data={[...samples]} fill={chartColors.copper} isAnimationActive={false} />
          <Scatter
            name="Fitted creep law"
            data={[...curve]}
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
          { label: 'Samples', value: seriesText(samples, creepAxes) },
          { label: 'Fitted creep law', value: seriesText(curve, creepAxes, { count: false }) },
        ]}
      />
    </div>
  );
}
