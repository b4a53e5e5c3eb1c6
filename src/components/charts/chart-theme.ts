// The one chart theme: colours for SVG attributes (the same values as the tokens in src/index.css) and
// the text styles of ticks and axis labels, for every plot in the app.
import { formatTick } from '@shared/format/measured-number.ts';
export const chartColors = {
  ink: '#1D232B',
  inkSoft: '#4A525C',
  rule: '#D8D3C8',
  copper: '#B5532A',
  teal: '#2F6F73',
  tealDark: '#23575A',
  amber: '#C98A00',
  danger: '#B42318',
} as const;

/** Axis tick text in the monospace figures used for every number. */
export const tickStyle = {
  fontFamily: '"JetBrains Mono Variable", ui-monospace, monospace',
  fontSize: 11,
  fill: chartColors.inkSoft,
} as const;

/** Axis label text. */
export const axisLabelStyle = { fontSize: 12, fill: chartColors.inkSoft } as const;

/** Legends of recharts' own (`<Legend wrapperStyle={legendStyle} />`): the size of the page's small text (text-sm). */
export const legendStyle = { fontSize: '0.875rem', lineHeight: '1.25rem' } as const;

/** Tooltip box: monospace figures, the rule colour for its border. */
export const tooltipStyle = { fontFamily: tickStyle.fontFamily, fontSize: 12, borderColor: chartColors.rule } as const;

/** Ticks of a number axis: the figures' font, printed by the one tick formatter. */
export const numberTicks = { tick: tickStyle, tickFormatter: formatTick } as const;

/** The label under an x axis. */
export const xAxisLabel = (value: string, offset = -14) => ({ value, position: 'insideBottom', offset, style: axisLabelStyle }) as const;

/** The label along a y axis, reading upwards. */
export const yAxisLabel = (value: string) =>
  ({ value, angle: -90, position: 'insideLeft', offset: 4, style: { ...axisLabelStyle, textAnchor: 'middle' } }) as const;
