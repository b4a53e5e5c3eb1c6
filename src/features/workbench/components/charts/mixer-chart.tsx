import {
  CartesianGrid,
  Legend,
  ReferenceDot,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  XAxis,
  YAxis,
  useXAxisScale,
  useYAxisScale,
} from 'recharts';
import { niceStep, stepTicks } from './axis-ticks.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, legendStyle, numberTicks, xAxisLabel, yAxisLabel } from '@/components/charts/chart-theme.ts';
import { ChartFigures } from '@/components/charts/chart-figures.tsx';

/** A point of the tip plane in nm. */
export interface PlanePoint {
  xNm: number;
  yNm: number;
}

function RegionPolygon({ corners }: { corners: readonly PlanePoint[] }) {
  const sx = useXAxisScale();
  const sy = useYAxisScale();
  if (!sx || !sy) return null;
  const pts = corners.map((c) => `${sx(c.xNm)},${sy(c.yNm)}`).join(' ');
  return <polygon points={pts} fill={chartColors.teal} fillOpacity={0.12} stroke={chartColors.teal} strokeWidth={1.5} />;
}

/** Equal spans on both axes with 1-2-5 ticks, so the parallelogram keeps its true shape. */
function squareAxes(points: readonly PlanePoint[]): { x: number[]; y: number[] } {
  const xs = points.map((p) => p.xNm);
  const ys = points.map((p) => p.yNm);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1;
  const step = niceStep(span / 6);
  const snap = (lo: number, hi: number) => [Math.floor((lo - span * 0.04) / step), Math.ceil((hi + span * 0.04) / step)];
  const [x0, x1] = snap(Math.min(...xs), Math.max(...xs));
  const [y0, y1] = snap(Math.min(...ys), Math.max(...ys));
  const n = Math.max(x1 - x0, y1 - y0);
  const xLo = x0 - Math.floor((n - (x1 - x0)) / 2);
  const yLo = y0 - Math.floor((n - (y1 - y0)) / 2);
  return { x: stepTicks(xLo * step, (xLo + n) * step, step), y: stepTicks(yLo * step, (yLo + n) * step, step) };
}

const noMarker = () => <g />;
const cornersText = (ps: readonly PlanePoint[]) => ps.map((p) => `(${formatShort(p.xNm)}, ${formatShort(p.yNm)})`).join(', ') + ' nm';

/** Reachable region (teal parallelogram) with the wanted point: copper dot if reachable, red ring if not. */
export function MixerChart({ region, target }: { region: readonly PlanePoint[]; target: (PlanePoint & { reachable: boolean }) | null }) {
  const axes = squareAxes([...region, { xNm: 0, yNm: 0 }, ...(target ? [target] : [])]);
  const domain = { x: [axes.x[0], axes.x[axes.x.length - 1]], y: [axes.y[0], axes.y[axes.y.length - 1]] };
  return (
    <div>
      <ResponsiveContainer width="100%" aspect={1} maxHeight={420}>
        <ScatterChart margin={{ top: 4, right: 12, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis
            type="number"
            dataKey="xNm"
            domain={domain.x}
            ticks={axes.x}
            allowDataOverflow
            {...numberTicks}
            label={xAxisLabel('x (nm)')}
          />
          <YAxis
            type="number"
            dataKey="yNm"
            domain={domain.y}
            ticks={axes.y}
            allowDataOverflow
            width={72}
            {...numberTicks}
            label={yAxisLabel('y (nm)')}
          />
          <Legend verticalAlign="top" itemSorter={null} wrapperStyle={legendStyle} />
          <RegionPolygon corners={region} />
          <Scatter
            name="Reachable region"
            data={[...region]}
            fill={chartColors.teal}
            shape={noMarker}
            legendType="square"
            isAnimationActive={false}
          />
          <ReferenceDot x={0} y={0} r={3} fill={chartColors.ink} stroke="none" />
          {target && (
            <Scatter
              name={target.reachable ? 'Wanted point (reachable)' : 'Wanted point (out of reach)'}
              data={[target]}
              fill={target.reachable ? chartColors.copper : chartColors.danger}
              shape={target.reachable ? 'circle' : 'cross'}
              legendType={target.reachable ? 'circle' : 'cross'}
              isAnimationActive={false}
            />
          )}
        </ScatterChart>
      </ResponsiveContainer>
      <ChartFigures
        figures={[
          { label: 'Reachable region, corners', value: cornersText(region) },
          ...(target
            ? [{ label: target.reachable ? 'Wanted point, reachable' : 'Wanted point, out of reach', value: cornersText([target]) }]
            : []),
        ]}
      />
    </div>
  );
}
