import { useEffect, useRef, useState } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { axisOf, scaleOf, type AxisSpec } from './chart-axes.ts';
import { drawLayers, nearestTip, type ChartLayer } from './chart-layers.ts';
import { ChartLegend, type LegendItem } from './chart-legend.tsx';
import { ChartFigures, type ChartFigure } from './chart-figures.tsx';
import { installShiftPan } from './chart-pan.ts';
import { axisLabelFont } from './chart-theme.ts';

export interface UplotChartProps {
  x: AxisSpec;
  y: AxisSpec;
  layers: readonly ChartLayer[];
  legend?: readonly LegendItem[];
  /** The text alternative under the chart: the figures it shows. */
  figures: readonly ChartFigure[];
  /** Height in CSS pixels; `square` makes it the width (capped at `height`). */
  height: number;
  square?: boolean;
  /** Drag across the plot zooms x, shift-drag pans, double-click or "Reset zoom" returns to the whole range. */
  zoom?: boolean;
}

const tooSmall = (d: readonly [number, number]): [number, number] =>
  d[1] > d[0] ? [d[0], d[1]] : [d[0] - (Math.abs(d[0]) || 1) * 0.1, d[0] + (Math.abs(d[0]) || 1) * 0.1];

/**
 * Every chart of the app: uPlot draws the axes, grid and zoom selection on a canvas, the chart's layers are drawn
 * over the plot area by `drawLayers` (markers up to 2 000 points, one square per pixel beyond), the legend is HTML
 * at the text size and `ChartFigures` lists the figures in words. On the plot, `data-drawn-at` holds the time of the
 * last drawing (performance.now()), `data-first-draw-ms` how long the chart took from creation to its first drawing,
 * `data-markers` the points it drew and `data-x-range` the x range shown, for the benchmarks and the browser tests.
 */
export function UplotChart({ x, y, layers, legend = [], figures, height, square = false, zoom = false }: UplotChartProps) {
  const box = useRef<HTMLDivElement>(null);
  const tip = useRef<HTMLDivElement>(null);
  const chart = useRef<uPlot | null>(null);
  const [zoomed, setZoomed] = useState(false);

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const created = performance.now();
    let first = true;
    const xDomain = tooSmall(x.domain);
    const yDomain = tooSmall(y.domain);
    const sizeFor = (width: number) => ({ width, height: square ? Math.min(width, height) : height });
    const opts: uPlot.Options = {
      ...sizeFor(el.clientWidth || 300),
      padding: [10, 18, 0, y.hidden ? 18 : 0],
      legend: { show: false },
      scales: { x: scaleOf({ ...x, domain: xDomain }, zoom), y: scaleOf({ ...y, domain: yDomain }, false) },
      axes: [axisOf(x, 'x'), axisOf(y, 'y')],
      series: [{}, { scale: 'y', auto: false, stroke: 'transparent', width: 0, points: { show: false } }],
      cursor: {
        x: false,
        y: false,
        points: { show: false },
        drag: { x: zoom, y: false, setScale: zoom },
      },
      hooks: {
        draw: [
          (u) => {
            const ctx = u.ctx;
            ctx.save();
            const markers = drawLayers(
              ctx,
              {
                x: (v) => u.valToPos(v, 'x', true),
                y: (v) => u.valToPos(v, 'y', true),
                left: u.bbox.left,
                top: u.bbox.top,
                width: u.bbox.width,
                height: u.bbox.height,
                dpr: uPlot.pxRatio,
              },
              layers,
              axisLabelFont,
            );
            ctx.restore();
            const now = performance.now();
            el.dataset.markers = String(markers);
            el.dataset.drawnAt = String(now);
            if (first) el.dataset.firstDrawMs = (now - created).toFixed(1);
            first = false;
          },
        ],
        setScale: [
          (u, key) => {
            if (key !== 'x') return;
            const { min, max } = u.scales.x;
            el.dataset.xRange = `${min},${max}`;
            const span = xDomain[1] - xDomain[0];
            setZoomed(min != null && max != null && (Math.abs(min - xDomain[0]) > span * 1e-9 || Math.abs(max - xDomain[1]) > span * 1e-9));
          },
        ],
        setCursor: [
          (u) => {
            const t = tip.current;
            if (!t) return;
            const { left, top } = u.cursor;
            const hit =
              left != null && top != null && left >= 0
                ? nearestTip(layers, (vx, vy) => [u.valToPos(vx, 'x'), u.valToPos(vy, 'y')], left, top)
                : null;
            if (!hit) {
              t.hidden = true;
              return;
            }
            t.textContent = hit.text;
            t.hidden = false;
            t.style.left = `${u.bbox.left / uPlot.pxRatio + hit.x + 10}px`;
            t.style.top = `${u.bbox.top / uPlot.pxRatio + hit.y + 10}px`;
          },
        ],
      },
    };
    const u = new uPlot(opts, [xDomain, [null, null]], el);
    chart.current = u;
    setZoomed(false);
    const removePan = zoom ? installShiftPan(u, x.log === true) : () => undefined;
    const resize = new ResizeObserver(() => {
      const width = el.clientWidth;
      if (width > 0 && width !== u.width) u.setSize(sizeFor(width));
    });
    resize.observe(el);
    return () => {
      resize.disconnect();
      removePan();
      u.destroy();
      chart.current = null;
    };
  }, [x, y, layers, height, square, zoom]);

  const reset = () => {
    const u = chart.current;
    const [min, max] = tooSmall(x.domain);
    if (u) u.setScale('x', { min, max });
  };

  return (
    <div data-testid="chart">
      {zoom && (
        <div className="mb-1 flex flex-wrap items-center justify-end gap-x-3 text-sm text-ink-soft">
          <span className="pointer-coarse:hidden">Drag to zoom, shift-drag to pan, double-click to reset.</span>
          <button
            type="button"
            className="rounded border border-rule px-2 py-0.5 text-ink hover:bg-paper disabled:text-ink-soft disabled:opacity-60"
            disabled={!zoomed}
            onClick={reset}
          >
            Reset zoom
          </button>
        </div>
      )}
      <div className="relative">
        <div ref={box} role="img" aria-label="Chart; its figures are listed below it" data-zoomed={zoomed || undefined} />
        <div
          ref={tip}
          hidden
          className="pointer-events-none absolute z-10 max-w-64 rounded-md border border-rule bg-white px-3 py-2 text-xs whitespace-pre-line shadow"
        />
      </div>
      <ChartLegend items={legend} />
      <ChartFigures figures={figures} />
    </div>
  );
}
