import { CartesianGrid, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, tickStyle, tooltipStyle } from './chart-theme.ts';
import { ChartFigures, seriesText, type ChartFigure } from './chart-figures.tsx';

/** One calibration point already in volts and nanometres. */
export interface CalibrationChartPoint {
  volts: number;
  displacementNm: number;
  sweep?: 'up' | 'down';
}

const number = (v: number) => (Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(4))));

/** A padded domain around [min, max] and about five round ticks inside it (1, 2, 2.5 or 5 × 10ⁿ apart). */
function axis(min: number, max: number): { domain: [number, number]; ticks: number[] } {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return { domain: [0, 1], ticks: [] };
  const pad = (max - min) * 0.04 || Math.abs(max) * 0.1 || 1;
  const lo = min - pad;
  const hi = max + pad;
  const raw = (hi - lo) / 5;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10]
    .map((m) => m * power)
    .reduce((best, s) => (Math.abs(Math.log(s / raw)) < Math.abs(Math.log(best / raw)) ? s : best));
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi; t += step) ticks.push(Number(t.toPrecision(12)));
  return { domain: [lo, hi], ticks };
}

const unitOf: Record<string, string> = { Drive: 'V', Displacement: 'nm' };

/** Most markers drawn; longer runs are thinned evenly for the plot only (fits always use every point). */
export const MAX_PLOTTED_POINTS = 2000;

function thin<T>(items: readonly T[], max: number): T[] {
  if (items.length <= max) return [...items];
  const stride = items.length / max;
  return Array.from({ length: max }, (_, i) => items[Math.floor(i * stride)]!);
}

/**
 * Displacement against drive voltage: up sweep as copper circles, down sweep as teal triangles
 * (each joined faintly in recorded order so the hysteresis loop shows), unswept points in ink,
 * and the fitted line across the measured range. Import lazily: recharts is large.
 */
export function CalibrationChart({
  points: all,
  fit,
  height = 300,
}: {
  points: readonly CalibrationChartPoint[];
  fit: { interceptNm: number; gainNmPerV: number } | null;
  height?: number;
}) {
  const points = thin(all, MAX_PLOTTED_POINTS);
  const up = points.filter((p) => p.sweep === 'up');
  const down = points.filter((p) => p.sweep === 'down');
  const plain = points.filter((p) => p.sweep !== 'up' && p.sweep !== 'down');
  const volts = points.map((p) => p.volts);
  const vMin = Math.min(...volts);
  const vMax = Math.max(...volts);
  const line =
    fit && points.length > 1 && vMax > vMin
      ? ([
          { x: vMin, y: fit.interceptNm + fit.gainNmPerV * vMin },
          { x: vMax, y: fit.interceptNm + fit.gainNmPerV * vMax },
        ] as const)
      : null;
  const ys = [...points.map((p) => p.displacementNm), ...(line ? [line[0].y, line[1].y] : [])];
  const x = axis(vMin, vMax);
  const y = axis(Math.min(...ys), Math.max(...ys));
  const axes = [
    ['drive', (p: CalibrationChartPoint) => p.volts, 'V'],
    ['displacement', (p: CalibrationChartPoint) => p.displacementNm, 'nm'],
  ] as const;
  const figures: ChartFigure[] = [
    ...(
      [
        ['Up sweep', all.filter((p) => p.sweep === 'up')],
        ['Down sweep', all.filter((p) => p.sweep === 'down')],
        ['Points', all.filter((p) => p.sweep !== 'up' && p.sweep !== 'down')],
      ] as const
    )
      .filter(([, ps]) => ps.length > 0)
      .map(([label, ps]) => ({ label, value: seriesText(ps, axes) })),
    ...(fit && line
      ? [{ label: 'Fitted gain', value: `${formatShort(fit.gainNmPerV, 4)} nm/V, intercept ${formatShort(fit.interceptNm)} nm` }]
      : []),
    ...(all.length > points.length ? [{ label: 'Drawn', value: `${points.length} of ${all.length} points, evenly spaced` }] : []),
  ];

  return (
    <div>
      <ResponsiveContainer width="100%" height={height}>
        <ScatterChart margin={{ top: 10, right: 14, bottom: 26, left: 4 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" />
          <XAxis
            type="number"
            dataKey="volts"
            name="Drive"
            domain={x.domain}
            ticks={x.ticks}
            tick={tickStyle}
            tickFormatter={number}
            label={{ value: 'Drive (V)', position: 'bottom', offset: 10, fill: chartColors.inkSoft, fontSize: 12 }}
          />
          <YAxis
            type="number"
            dataKey="displacementNm"
            name="Displacement"
            domain={y.domain}
            ticks={y.ticks}
            tick={tickStyle}
            tickFormatter={number}
            width={52}
            label={{
              value: 'Displacement (nm)',
              angle: -90,
              position: 'insideLeft',
              offset: 0,
              fill: chartColors.inkSoft,
              fontSize: 12,
              style: { textAnchor: 'middle' },
            }}
          />
          <Tooltip
            cursor={{ strokeDasharray: '3 3' }}
            formatter={(v, name) => [`${typeof v === 'number' ? number(v) : String(v)} ${unitOf[String(name)] ?? ''}`, name]}
            contentStyle={tooltipStyle}
          />
          {line && <ReferenceLine segment={[line[0], line[1]]} stroke={chartColors.ink} strokeWidth={1.5} ifOverflow="hidden" />}
          {up.length > 0 && (
            <Scatter
              name="Up sweep"
              data={up}
              fill={chartColors.copper}
              shape="circle"
              line={{ stroke: chartColors.copper, strokeOpacity: 0.35 }}
              isAnimationActive={false}
            />
          )}
          {down.length > 0 && (
            <Scatter
              name="Down sweep"
              data={down}
              fill={chartColors.teal}
              shape="triangle"
              line={{ stroke: chartColors.teal, strokeOpacity: 0.35 }}
              isAnimationActive={false}
            />
          )}
          {plain.length > 0 && <Scatter name="Points" data={plain} fill={chartColors.ink} shape="circle" isAnimationActive={false} />}
        </ScatterChart>
      </ResponsiveContainer>
      <ul className="mt-1 flex flex-wrap justify-center gap-x-4 gap-y-1 text-sm text-ink-soft" aria-label="Legend">
        {up.length > 0 && (
          <li className="flex items-center gap-1">
            <svg width="10" height="10" aria-hidden="true">
              <circle cx="5" cy="5" r="4" fill={chartColors.copper} />
            </svg>
            Up sweep
          </li>
        )}
        {down.length > 0 && (
          <li className="flex items-center gap-1">
            <svg width="10" height="10" aria-hidden="true">
              <path d="M5 1 9 9H1z" fill={chartColors.teal} />
            </svg>
            Down sweep
          </li>
        )}
        {plain.length > 0 && (
          <li className="flex items-center gap-1">
            <svg width="10" height="10" aria-hidden="true">
              <circle cx="5" cy="5" r="4" fill={chartColors.ink} />
            </svg>
            Points
          </li>
        )}
        {line && (
          <li className="flex items-center gap-1">
            <svg width="16" height="10" aria-hidden="true">
              <path d="M1 5h14" stroke={chartColors.ink} strokeWidth="1.5" />
            </svg>
            Fitted line
          </li>
        )}
      </ul>
      <ChartFigures figures={figures} />
    </div>
  );
}
