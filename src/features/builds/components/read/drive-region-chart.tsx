import {
  CartesianGrid,
  ReferenceDot,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  XAxis,
  YAxis,
  useXAxisScale,
  useYAxisScale,
} from 'recharts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, numberTicks, xAxisLabel, yAxisLabel } from '@/components/charts/chart-theme.ts';
import { ChartFigures } from '@/components/charts/chart-figures.tsx';

interface PlanePoint {
  xNm: number;
  yNm: number;
}

function Parallelogram({ corners }: { corners: readonly PlanePoint[] }) {
  const sx = useXAxisScale();
  const sy = useYAxisScale();
  if (!sx || !sy) return null;
  return (
    <polygon
      points={corners.map((c) => `${sx(c.xNm)},${sy(c.yNm)}`).join(' ')}
      fill={chartColors.teal}
      fillOpacity={0.14}
      stroke={chartColors.teal}
      strokeWidth={1.5}
    />
  );
}

/** A 1-2-5 step giving about four intervals over `span` [practice: the usual chart tick rule]. */
function niceStep(span: number): number {
  const raw = span / 4;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  return (f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10) * mag;
}

const ticksIn = (lo: number, hi: number, step: number) => {
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
};

/** One span for both axes around the corners and the rest position, so the parallelogram keeps its shape. */
function squareAxes(points: readonly PlanePoint[]) {
  const xs = points.map((p) => p.xNm);
  const ys = points.map((p) => p.yNm);
  const half = (Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1) * 0.55;
  const cx = (Math.max(...xs) + Math.min(...xs)) / 2;
  const cy = (Math.max(...ys) + Math.min(...ys)) / 2;
  const step = niceStep(2 * half);
  const x: [number, number] = [cx - half, cx + half];
  const y: [number, number] = [cy - half, cy + half];
  return { x, y, xTicks: ticksIn(x[0], x[1], step), yTicks: ticksIn(y[0], y[1], step) };
}

const noMarker = () => <g />;
const cornersText = (ps: readonly PlanePoint[]) => ps.map((p) => `(${formatShort(p.xNm)}, ${formatShort(p.yNm)})`).join(', ') + ' nm';

/** A small plot of the positions a saved drive matrix reaches within its limits, with the rest position (x₀, y₀). */
export function DriveRegionChart({ region, rest }: { region: readonly PlanePoint[]; rest: PlanePoint }) {
  const domain = squareAxes([...region, rest]);
  return (
    <div>
      <ResponsiveContainer width="100%" aspect={1}>
        <ScatterChart margin={{ top: 4, right: 8, bottom: 20, left: 4 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis
            type="number"
            dataKey="xNm"
            domain={domain.x}
            allowDataOverflow
            ticks={domain.xTicks}
            {...numberTicks}
            label={xAxisLabel('x (nm)', -12)}
          />
          <YAxis
            type="number"
            dataKey="yNm"
            domain={domain.y}
            allowDataOverflow
            ticks={domain.yTicks}
            width={64}
            {...numberTicks}
            label={yAxisLabel('y (nm)')}
          />
          <Parallelogram corners={region} />
          <Scatter name="Reachable region" data={[...region]} fill={chartColors.teal} shape={noMarker} isAnimationActive={false} />
          <ReferenceDot x={rest.xNm} y={rest.yNm} r={3} fill={chartColors.ink} stroke="none" />
        </ScatterChart>
      </ResponsiveContainer>
      <ChartFigures
        figures={[
          { label: 'Reachable region, corners', value: cornersText(region) },
          { label: 'Rest position', value: cornersText([rest]) },
        ]}
      />
    </div>
  );
}
