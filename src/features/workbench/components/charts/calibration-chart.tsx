import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatSig, formatTick } from '../../format.ts';
import { axisLabelStyle, chartColors, tickStyle } from './chart-style.ts';

/** One plotted point in V and nm, with the sweep it was taken on. */
export interface PlotPoint {
  v: number;
  x: number;
  sweep?: 'up' | 'down';
}

/** Most markers drawn; longer runs are thinned evenly for the plot only (the fit uses every point). */
export const MAX_PLOTTED_POINTS = 2000;

function thin<T>(items: readonly T[], max: number): T[] {
  if (items.length <= max) return [...items];
  const stride = items.length / max;
  return Array.from({ length: max }, (_, i) => items[Math.floor(i * stride)]);
}

const noMarker = () => <g />;

/** Displacement against drive: up sweep copper circles, down sweep teal triangles, others ink squares, fit line ink. */
export function CalibrationChart({ points, line }: { points: readonly PlotPoint[]; line: readonly [PlotPoint, PlotPoint] }) {
  const shown = thin(points, MAX_PLOTTED_POINTS);
  const up = shown.filter((p) => p.sweep === 'up');
  const down = shown.filter((p) => p.sweep === 'down');
  const none = shown.filter((p) => p.sweep === undefined);
  return (
    <ResponsiveContainer width="100%" height={300}>
      <ScatterChart margin={{ top: 4, right: 12, bottom: 24, left: 8 }}>
        <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
        <XAxis
          type="number"
          dataKey="v"
          name="Drive (V)"
          domain={['auto', 'auto']}
          tick={tickStyle}
          tickFormatter={formatTick}
          label={{ value: 'Drive (V)', position: 'insideBottom', offset: -14, style: axisLabelStyle }}
        />
        <YAxis
          type="number"
          dataKey="x"
          name="Displacement (nm)"
          width={72}
          tick={tickStyle}
          tickFormatter={formatTick}
          label={{ value: 'Displacement (nm)', angle: -90, position: 'insideLeft', offset: 4, style: { ...axisLabelStyle, textAnchor: 'middle' } }}
        />
        <Tooltip cursor={{ strokeDasharray: '3 3' }} formatter={(value) => (typeof value === 'number' ? formatSig(value) : String(value))} />
        <Legend verticalAlign="top" itemSorter={null} />
        {up.length > 0 && <Scatter name="Up sweep" data={up} fill={chartColors.copper} shape="circle" isAnimationActive={false} />}
        {down.length > 0 && <Scatter name="Down sweep" data={down} fill={chartColors.teal} shape="triangle" isAnimationActive={false} />}
        {none.length > 0 && <Scatter name="No sweep given" data={none} fill={chartColors.ink} shape="square" isAnimationActive={false} />}
        <Scatter
          name="Fit line"
          data={[...line]}
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
