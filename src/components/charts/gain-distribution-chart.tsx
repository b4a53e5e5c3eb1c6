import { CartesianGrid, ReferenceArea, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import { summarize } from '@shared/stats/quantiles.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors, tickStyle } from './chart-theme.ts';
import { ChartFigures, rangeText } from './chart-figures.tsx';

const number = (v: number) => (Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(3))));
/** Spread the dots vertically in a fixed pattern (golden-ratio steps) so equal gains stay visible. */
const jitter = (i: number) => 0.3 + ((i * 0.618034) % 1) * 0.4;

/** Round steps (1, 2 or 5 × 10ⁿ) covering [lo, hi] in about four intervals. */
function linearTicks(lo: number, hi: number): number[] {
  const raw = (hi - lo) / 4 || Math.abs(hi) / 4 || 1;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((st) => st >= raw) ?? 10 * mag;
  const ticks: number[] = [];
  for (let t = Math.floor(lo / step) * step; ticks.length < 50; t += step) {
    ticks.push(Number(t.toPrecision(12)));
    if (t >= hi - step * 1e-9) break;
  }
  return ticks;
}

function logTicks(lo: number, hi: number): number[] {
  const ticks: number[] = [];
  for (let e = Math.floor(Math.log10(lo)); e <= Math.ceil(Math.log10(hi)); e++) {
    for (const m of [1, 2, 5]) {
      const t = m * 10 ** e;
      if (t >= lo && t <= hi) ticks.push(t);
    }
  }
  return ticks;
}

/**
 * A part's accepted gains (nm/V, magnitudes) as a strip of dots over a box from the lower to the
 * upper quartile with the median, whiskers to the extremes, the candidate run as a copper diamond
 * and the expected gain as a dashed line. Switches to a log scale when values span more than ×20
 * (a unit slip would otherwise squash the rest). Import lazily: recharts is large.
 */
export function GainDistributionChart({
  gains,
  candidateNmPerV,
  expectedNmPerV = null,
  height = 150,
}: {
  gains: number[];
  candidateNmPerV: number;
  expectedNmPerV?: number | null;
  height?: number;
}) {
  const s = summarize(gains);
  const candidate = Math.abs(candidateNmPerV);
  const all = [...gains, candidate, ...(expectedNmPerV ? [expectedNmPerV] : [])].filter((v) => Number.isFinite(v) && v > 0);
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const log = lo > 0 && hi / lo > 20;
  const pad = (hi - lo) * 0.12 || hi * 0.15 || 1;
  const ticks = log ? logTicks(lo / 1.5, hi * 1.5) : linearTicks(Math.max(0, lo - pad), hi + pad);
  const domain: [number, number] = log ? [lo / 1.5, hi * 1.5] : [ticks[0], ticks[ticks.length - 1]];
  const dots = gains.map((g, i) => ({ gain: g, y: jitter(i) }));

  return (
    <div>
      <ResponsiveContainer width="100%" height={height}>
        <ScatterChart margin={{ top: 10, right: 18, bottom: 24, left: 18 }}>
          <CartesianGrid stroke={chartColors.rule} strokeDasharray="3 3" vertical horizontal={false} />
          <XAxis
            type="number"
            dataKey="gain"
            scale={log ? 'log' : 'auto'}
            domain={domain}
            ticks={ticks}
            allowDataOverflow
            tick={tickStyle}
            tickFormatter={number}
            label={{
              value: `Gain (nm/V)${log ? ', log scale' : ''}`,
              position: 'bottom',
              offset: 6,
              fill: chartColors.inkSoft,
              fontSize: 12,
            }}
          />
          <YAxis type="number" dataKey="y" domain={[0, 1]} hide />
          {s.p25 !== null && s.p75 !== null && (
            <ReferenceArea
              x1={s.p25}
              x2={s.p75}
              y1={0.22}
              y2={0.78}
              fill={chartColors.teal}
              fillOpacity={0.14}
              stroke={chartColors.teal}
              strokeOpacity={0.6}
            />
          )}
          {s.min !== null && s.p25 !== null && (
            <ReferenceLine
              segment={[
                { x: s.min, y: 0.5 },
                { x: s.p25, y: 0.5 },
              ]}
              stroke={chartColors.teal}
            />
          )}
          {s.max !== null && s.p75 !== null && (
            <ReferenceLine
              segment={[
                { x: s.p75, y: 0.5 },
                { x: s.max, y: 0.5 },
              ]}
              stroke={chartColors.teal}
            />
          )}
          {s.median !== null && (
            <ReferenceLine
              segment={[
                { x: s.median, y: 0.16 },
                { x: s.median, y: 0.84 },
              ]}
              stroke={chartColors.tealDark}
              strokeWidth={2.5}
            />
          )}
          {expectedNmPerV ? (
            <ReferenceLine x={expectedNmPerV} stroke={chartColors.ink} strokeDasharray="5 4" ifOverflow="extendDomain" />
          ) : null}
          {dots.length > 0 && (
            <Scatter name="Accepted runs" data={dots} fill={chartColors.teal} fillOpacity={0.75} shape="circle" isAnimationActive={false} />
          )}
          <Scatter
            name="This run"
            data={[{ gain: candidate, y: 0.5 }]}
            fill={chartColors.copper}
            stroke={chartColors.ink}
            shape="diamond"
            legendType="diamond"
            isAnimationActive={false}
          />
        </ScatterChart>
      </ResponsiveContainer>
      <ul className="mt-1 flex flex-wrap justify-center gap-x-4 gap-y-1 text-sm text-ink-soft" aria-label="Legend">
        {dots.length > 0 && (
          <li className="flex items-center gap-1">
            <svg width="10" height="10" aria-hidden="true">
              <circle cx="5" cy="5" r="4" fill={chartColors.teal} />
            </svg>
            Accepted runs
          </li>
        )}
        {s.n > 1 && (
          <li className="flex items-center gap-1">
            <svg width="16" height="10" aria-hidden="true">
              <rect x="1" y="1" width="14" height="8" fill={chartColors.teal} fillOpacity="0.14" stroke={chartColors.teal} />
              <path d="M8 0v10" stroke={chartColors.tealDark} strokeWidth="2" />
            </svg>
            Quartiles and median
          </li>
        )}
        <li className="flex items-center gap-1">
          <svg width="12" height="12" aria-hidden="true">
            <path d="M6 0.5 11.5 6 6 11.5 0.5 6z" fill={chartColors.copper} stroke={chartColors.ink} />
          </svg>
          This run
        </li>
        {expectedNmPerV ? (
          <li className="flex items-center gap-1">
            <svg width="16" height="10" aria-hidden="true">
              <path d="M1 5h14" stroke={chartColors.ink} strokeDasharray="4 3" />
            </svg>
            Expected from geometry
          </li>
        ) : null}
      </ul>
      <ChartFigures
        figures={[
          { label: 'This run', value: `${formatShort(candidate)} nm/V` },
          ...(s.n > 0 ? [{ label: 'Accepted runs', value: `${s.n}, ${rangeText(gains, 'nm/V')}` }] : []),
          ...(s.median !== null ? [{ label: 'Median', value: `${formatShort(s.median)} nm/V` }] : []),
          ...(s.p25 !== null && s.p75 !== null
            ? [{ label: 'Quartiles', value: `${formatShort(s.p25)} and ${formatShort(s.p75)} nm/V` }]
            : []),
          ...(expectedNmPerV ? [{ label: 'Expected from geometry', value: `${formatShort(expectedNmPerV)} nm/V` }] : []),
        ]}
      />
    </div>
  );
}
