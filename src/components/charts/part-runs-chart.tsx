import {
  CartesianGrid,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
  type TooltipContentProps,
  type TooltipValueType,
} from 'recharts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, tickStyle } from './chart-theme.ts';
import { ChartFigures } from './chart-figures.tsx';

/** One accepted run as the strip plot shows it. */
export interface PartRunsChartRun {
  id: number;
  gainNmPerV: number;
  buildTitle: string;
  maker: string;
  method: string;
}

const fmt = (v: number) => (Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(3))));
/** Fixed vertical spread (golden-ratio steps) so runs of equal gain stay visible side by side. */
const jitter = (i: number) => 0.25 + ((i * 0.618034) % 1) * 0.5;

function logTicks(lo: number, hi: number): number[] {
  const ticks: number[] = [];
  for (let e = Math.floor(Math.log10(lo)); e <= Math.ceil(Math.log10(hi)); e++)
    for (const m of [1, 2, 5]) if (m * 10 ** e >= lo && m * 10 ** e <= hi) ticks.push(m * 10 ** e);
  return ticks;
}

/** A domain widened to round steps (1, 2, 2.5 or 5 × 10ⁿ) and about five ticks on those steps. */
function linearAxis(lo: number, hi: number): { domain: [number, number]; ticks: number[] } {
  const raw = (hi - lo) / 5 || Math.abs(hi) / 5 || 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((v) => v >= raw) ?? 10 * power;
  const from = Math.max(0, Math.floor(lo / step) * step);
  const to = Math.ceil(hi / step) * step;
  const ticks: number[] = [];
  for (let t = from; t <= to + step / 1e6; t += step) ticks.push(Number(t.toPrecision(12)));
  return { domain: [from, to], ticks };
}

type Dot = PartRunsChartRun & { y: number };

function RunTooltip({ active, payload }: TooltipContentProps<TooltipValueType, string | number>) {
  const dot = active ? (payload?.[0]?.payload as Dot | undefined) : undefined;
  if (!dot) return null;
  return (
    <div className="max-w-64 rounded-md border border-rule bg-white px-3 py-2 text-xs shadow">
      <p className="num text-sm font-semibold">{fmt(dot.gainNmPerV)} nm/V</p>
      <p className="mt-1 font-medium">{dot.buildTitle}</p>
      <p className="text-ink-soft">
        by {dot.maker} · {dot.method}
      </p>
    </div>
  );
}

/**
 * Every accepted run of a part as one dot on a gain axis (log when the values span more than ×20),
 * over the interquartile box with the median, and the expected gain from geometry as a dashed line in
 * an amber band. Hover or focus a dot for its build, maker and method. Import lazily: recharts is large.
 */
export function PartRunsChart({
  runs,
  median,
  p25,
  p75,
  expected,
  height = 170,
}: {
  runs: PartRunsChartRun[];
  median: number | null;
  p25: number | null;
  p75: number | null;
  expected: { gainNmPerV: number; lowNmPerV: number; highNmPerV: number } | null;
  height?: number;
}) {
  const values = [...runs.map((r) => r.gainNmPerV), ...(expected ? [expected.lowNmPerV, expected.highNmPerV] : [])].filter(
    (v) => Number.isFinite(v) && v > 0,
  );
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const log = hi / lo > 20;
  const pad = (hi - lo) * 0.05 || hi * 0.1 || 1;
  const linear = linearAxis(lo - pad, hi + pad);
  const domain: [number, number] = log ? [lo / 1.5, hi * 1.5] : linear.domain;
  const dots: Dot[] = runs.map((r, i) => ({ ...r, y: jitter(i) }));
  return (
    <div>
      <ResponsiveContainer width="100%" height={height}>
        <ScatterChart margin={{ top: 8, right: 18, bottom: 24, left: 18 }} accessibilityLayer>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" vertical horizontal={false} />
          <XAxis
            type="number"
            dataKey="gainNmPerV"
            name="Gain"
            scale={log ? 'log' : 'auto'}
            domain={domain}
            allowDataOverflow
            ticks={log ? logTicks(domain[0], domain[1]) : linear.ticks}
            tick={tickStyle}
            tickFormatter={fmt}
            label={{
              value: `Gain (nm/V)${log ? ', log scale' : ''}`,
              position: 'bottom',
              offset: 6,
              fill: chartColors.inkSoft,
              fontSize: 12,
            }}
          />
          <YAxis type="number" dataKey="y" domain={[0, 1]} hide />
          {expected && (
            <ReferenceArea
              x1={expected.lowNmPerV}
              x2={expected.highNmPerV}
              y1={0}
              y2={1}
              fill={chartColors.amber}
              fillOpacity={0.1}
              ifOverflow="hidden"
            />
          )}
          {expected && (
            <ReferenceLine x={expected.gainNmPerV} stroke={chartColors.amber} strokeWidth={1.5} strokeDasharray="6 4" ifOverflow="hidden" />
          )}
          {p25 !== null && p75 !== null && runs.length > 1 && (
            <ReferenceArea
              x1={p25}
              x2={p75}
              y1={0.15}
              y2={0.85}
              fill={chartColors.teal}
              fillOpacity={0.12}
              stroke={chartColors.teal}
              strokeOpacity={0.6}
            />
          )}
          {median !== null && (
            <ReferenceLine
              segment={[
                { x: median, y: 0.08 },
                { x: median, y: 0.92 },
              ]}
              stroke={chartColors.tealDark}
              strokeWidth={2.5}
            />
          )}
          <Tooltip content={RunTooltip} cursor={false} isAnimationActive={false} />
          <Scatter
            name="Accepted runs"
            data={dots}
            fill={chartColors.copper}
            fillOpacity={0.85}
            stroke="#fff"
            shape="circle"
            isAnimationActive={false}
          />
        </ScatterChart>
      </ResponsiveContainer>
      <ChartFigures
        figures={[
          {
            label: 'Accepted runs',
            value:
              runs.length === 0 ? 'none' : runs.map((r) => `${formatShort(r.gainNmPerV)} nm/V (${r.buildTitle}, ${r.maker})`).join('; '),
          },
          ...(median !== null ? [{ label: 'Median', value: `${formatShort(median)} nm/V` }] : []),
          ...(p25 !== null && p75 !== null && runs.length > 1
            ? [{ label: 'Quartiles', value: `${formatShort(p25)} and ${formatShort(p75)} nm/V` }]
            : []),
          ...(expected
            ? [
                {
                  label: 'Expected from geometry',
                  value: `${formatShort(expected.gainNmPerV)} nm/V (band ${formatShort(expected.lowNmPerV)} to ${formatShort(expected.highNmPerV)} nm/V)`,
                },
              ]
            : []),
        ]}
      />
    </div>
  );
}
