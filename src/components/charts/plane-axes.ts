// Axes for a plot of the tip plane (x and y in nm): one span on both, so a drive matrix's parallelogram keeps its true
// shape, with 1-2-5 ticks; and the points in words for the chart's figures. Used by the two-axis mixer and by the
// drive region a build page shows for a saved matrix.
import { formatShort } from '@shared/format/measured-number.ts';
import { niceStep, stepTicks } from './axis-ticks.ts';

/** A point of the tip plane in nm. */
export interface PlanePoint {
  xNm: number;
  yNm: number;
}

/**
 * Equal spans on both axes around `points`, as tick positions (the first and last are the domain), about
 * `divisions` ticks apart: fewer for a small plot, so its tick figures do not run into each other.
 */
export function squareAxes(points: readonly PlanePoint[], divisions = 6): { x: number[]; y: number[] } {
  const xs = points.map((p) => p.xNm);
  const ys = points.map((p) => p.yNm);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1;
  const step = niceStep(span / divisions);
  const snap = (lo: number, hi: number) => [Math.floor((lo - span * 0.04) / step), Math.ceil((hi + span * 0.04) / step)];
  const [x0, x1] = snap(Math.min(...xs), Math.max(...xs));
  const [y0, y1] = snap(Math.min(...ys), Math.max(...ys));
  const n = Math.max(x1 - x0, y1 - y0);
  const xLo = x0 - Math.floor((n - (x1 - x0)) / 2);
  const yLo = y0 - Math.floor((n - (y1 - y0)) / 2);
  return { x: stepTicks(xLo * step, (xLo + n) * step, step), y: stepTicks(yLo * step, (yLo + n) * step, step) };
}

/** The domain an axis's ticks span. */
export const tickDomain = (ticks: readonly number[]): [number, number] => [ticks[0]!, ticks.at(-1)!];

/** "(x, y), (x, y) nm": points for a chart's figures. */
export const planePointsText = (ps: readonly PlanePoint[]) =>
  ps.map((p) => `(${formatShort(p.xNm)}, ${formatShort(p.yNm)})`).join(', ') + ' nm';
