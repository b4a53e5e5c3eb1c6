import { Fragment } from 'react';
import { formatShort } from '@shared/format/measured-number.ts';

/** One line of a chart's text alternative: what it is, and its figures as words. */
export interface ChartFigure {
  label: string;
  value: string;
}

/** "0 to 40 V" for the values' range, "12 V" for one value, "none" for none; three significant figures. */
export function rangeText(values: readonly number[], unit: string): string {
  // A loop rather than Math.min(...values): a spread of 200 000 values overflows the call stack.
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo > hi) return 'none';
  return lo === hi ? `${formatShort(lo)} ${unit}` : `${formatShort(lo)} to ${formatShort(hi)} ${unit}`;
}

/** "12 points, x from 0 to 40 V, displacement from … nm" for a plotted series; `count: false` leaves the count out (a drawn curve). */
export function seriesText<P>(
  points: readonly P[],
  axes: ReadonlyArray<readonly [name: string, value: (p: P) => number, unit: string]>,
  opts: { count?: boolean } = {},
): string {
  if (points.length === 0) return 'no points';
  return [
    ...(opts.count === false ? [] : [`${points.length} ${points.length === 1 ? 'point' : 'points'}`]),
    ...axes.map(([name, value, unit]) => `${name} ${rangeText(points.map(value), unit)}`),
  ].join(', ');
}

/**
 * A chart's text alternative: the figures it shows, under the chart in a disclosure of our own wording, for
 * screen readers and for anyone who wants the numbers rather than the picture. Text at the page's size.
 */
export function ChartFigures({ figures }: { figures: readonly ChartFigure[] }) {
  return (
    <details className="mt-2 text-sm text-ink-soft">
      <summary className="cursor-pointer select-none hover:text-ink">Figures in this chart</summary>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
        {figures.map((f) => (
          <Fragment key={f.label}>
            <dt className="font-medium text-ink">{f.label}</dt>
            <dd>{f.value}</dd>
          </Fragment>
        ))}
      </dl>
    </details>
  );
}
