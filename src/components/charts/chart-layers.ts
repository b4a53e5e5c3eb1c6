// What a chart draws on its plot area, and the canvas code that draws it. Every chart hands the wrapper a list of
// layers in data units; the wrapper maps them through uPlot's scales, so zoom and pan move everything together.
import { axisColor } from './chart-theme.ts';

/** Marker shapes; legends draw the same ones. */
export type Marker = 'circle' | 'triangle' | 'diamond' | 'cross';

/** A set of points: markers while there are at most DRAW_MARKERS_UP_TO, else one small square per pixel. */
export interface PointsLayer {
  kind: 'points';
  xs: ArrayLike<number>;
  ys: ArrayLike<number>;
  color: string;
  marker?: Marker;
  /** Marker radius in CSS pixels (default 3.5). */
  radius?: number;
  opacity?: number;
  /** Outline around each marker. */
  outline?: string;
  /** A faint line through the points in their order (a sweep), left out above JOIN_UP_TO points. */
  join?: { opacity: number };
  /** Hover text per point (a tooltip); the chart's figures list says the same in words. */
  tips?: readonly string[];
}

/** A polyline through the points in order (a fitted curve, a segment), optionally dashed. */
export interface LineLayer {
  kind: 'line';
  xs: ArrayLike<number>;
  ys: ArrayLike<number>;
  color: string;
  width?: number;
  dash?: number[];
}

/** A closed, filled polygon (a reachable region). */
export interface PolygonLayer {
  kind: 'polygon';
  xs: readonly number[];
  ys: readonly number[];
  fill: string;
  fillOpacity: number;
  stroke?: string;
  width?: number;
}

/** A box between two x values and two y values (a band, a quartile box). */
export interface RectLayer {
  kind: 'rect';
  x: [number, number];
  y: [number, number];
  fill: string;
  fillOpacity: number;
  stroke?: string;
  strokeOpacity?: number;
}

/** A line across the whole plot at one value of x or y, with an optional label at its right end. */
export interface RuleLayer {
  kind: 'rule';
  axis: 'x' | 'y';
  at: number;
  color: string;
  width?: number;
  dash?: number[];
  label?: { text: string; below?: boolean };
}

export type ChartLayer = PointsLayer | LineLayer | PolygonLayer | RectLayer | RuleLayer;

/** Up to this many points a layer draws its markers; more draw as small squares, one per pixel. */
export const DRAW_MARKERS_UP_TO = 2000;
/** Up to this many points a sweep is joined by a faint line; a longer one is a cloud where the line adds nothing but time. */
export const JOIN_UP_TO = 20_000;

/** Maps data values to canvas pixels (device pixels, plot area included). */
export interface Projection {
  x: (v: number) => number;
  y: (v: number) => number;
  /** Plot area in device pixels. */
  left: number;
  top: number;
  width: number;
  height: number;
  /** Device pixels per CSS pixel. */
  dpr: number;
}

function markerPath(ctx: CanvasRenderingContext2D, marker: Marker, x: number, y: number, r: number) {
  switch (marker) {
    case 'circle':
      ctx.moveTo(x + r, y);
      ctx.arc(x, y, r, 0, 2 * Math.PI);
      break;
    case 'triangle':
      ctx.moveTo(x, y - r * 1.15);
      ctx.lineTo(x + r, y + r * 0.75);
      ctx.lineTo(x - r, y + r * 0.75);
      ctx.closePath();
      break;
    case 'diamond':
      ctx.moveTo(x, y - r * 1.3);
      ctx.lineTo(x + r * 1.3, y);
      ctx.lineTo(x, y + r * 1.3);
      ctx.lineTo(x - r * 1.3, y);
      ctx.closePath();
      break;
    case 'cross':
      ctx.moveTo(x - r, y - r);
      ctx.lineTo(x + r, y + r);
      ctx.moveTo(x + r, y - r);
      ctx.lineTo(x - r, y + r);
      break;
  }
}

function polyline(ctx: CanvasRenderingContext2D, p: Projection, xs: ArrayLike<number>, ys: ArrayLike<number>) {
  let open = false;
  for (let i = 0; i < xs.length; i++) {
    const x = p.x(xs[i]!);
    const y = p.y(ys[i]!);
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      open = false;
      continue;
    }
    if (open) ctx.lineTo(x, y);
    else ctx.moveTo(x, y);
    open = true;
  }
}

/**
 * Many points as one path of squares, at most one per device pixel: a point whose pixel is already set adds
 * nothing to the picture, so 100 000 points cost a pass over the array and a few thousand rectangles.
 */
function drawCloud(ctx: CanvasRenderingContext2D, p: Projection, layer: PointsLayer): number {
  const w = Math.ceil(p.width);
  const h = Math.ceil(p.height);
  const seen = new Uint8Array(w * h);
  const size = Math.max(2, Math.round(1.5 * p.dpr));
  ctx.beginPath();
  let drawn = 0;
  for (let i = 0; i < layer.xs.length; i++) {
    const px = Math.round(p.x(layer.xs[i]!) - p.left);
    const py = Math.round(p.y(layer.ys[i]!) - p.top);
    if (!(px >= 0 && px < w && py >= 0 && py < h)) continue;
    const cell = py * w + px;
    if (seen[cell]) continue;
    seen[cell] = 1;
    ctx.rect(p.left + px - size / 2, p.top + py - size / 2, size, size);
    drawn++;
  }
  ctx.fillStyle = layer.color;
  ctx.globalAlpha = layer.opacity ?? 1;
  ctx.fill();
  return drawn;
}

function drawPoints(ctx: CanvasRenderingContext2D, p: Projection, layer: PointsLayer): number {
  const n = layer.xs.length;
  if (layer.join && n <= JOIN_UP_TO) {
    ctx.beginPath();
    polyline(ctx, p, layer.xs, layer.ys);
    ctx.strokeStyle = layer.color;
    ctx.globalAlpha = layer.join.opacity;
    ctx.lineWidth = p.dpr;
    ctx.stroke();
  }
  if (n > DRAW_MARKERS_UP_TO) return drawCloud(ctx, p, layer);
  const marker = layer.marker ?? 'circle';
  const r = (layer.radius ?? 3.5) * p.dpr;
  let drawn = 0;
  ctx.beginPath();
  for (let i = 0; i < n; i++) {
    const x = p.x(layer.xs[i]!);
    const y = p.y(layer.ys[i]!);
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    markerPath(ctx, marker, x, y, r);
    drawn++;
  }
  ctx.globalAlpha = layer.opacity ?? 1;
  if (marker === 'cross') {
    ctx.strokeStyle = layer.color;
    ctx.lineWidth = 2 * p.dpr;
    ctx.stroke();
    return drawn;
  }
  ctx.fillStyle = layer.color;
  ctx.fill();
  if (layer.outline) {
    ctx.globalAlpha = 1;
    ctx.strokeStyle = layer.outline;
    ctx.lineWidth = p.dpr;
    ctx.stroke();
  }
  return drawn;
}

function stroke(ctx: CanvasRenderingContext2D, p: Projection, color: string, width = 1.5, dash: number[] = []) {
  ctx.globalAlpha = 1;
  ctx.strokeStyle = color;
  ctx.lineWidth = width * p.dpr;
  ctx.setLineDash(dash.map((d) => d * p.dpr));
  ctx.stroke();
  ctx.setLineDash([]);
}

/** Draws the layers in order, clipped to the plot area (the caller saves and restores the context); returns the markers drawn. */
export function drawLayers(ctx: CanvasRenderingContext2D, p: Projection, layers: readonly ChartLayer[], labelFont: string): number {
  let markers = 0;
  ctx.beginPath();
  ctx.rect(p.left, p.top, p.width, p.height);
  ctx.clip();
  for (const layer of layers) {
    switch (layer.kind) {
      case 'points':
        markers += drawPoints(ctx, p, layer);
        break;
      case 'line':
        ctx.beginPath();
        polyline(ctx, p, layer.xs, layer.ys);
        stroke(ctx, p, layer.color, layer.width, layer.dash);
        break;
      case 'polygon':
        ctx.beginPath();
        polyline(ctx, p, layer.xs, layer.ys);
        ctx.closePath();
        ctx.globalAlpha = layer.fillOpacity;
        ctx.fillStyle = layer.fill;
        ctx.fill();
        if (layer.stroke) stroke(ctx, p, layer.stroke, layer.width);
        break;
      case 'rect': {
        const x0 = p.x(layer.x[0]);
        const x1 = p.x(layer.x[1]);
        const y0 = p.y(layer.y[0]);
        const y1 = p.y(layer.y[1]);
        ctx.beginPath();
        ctx.rect(Math.min(x0, x1), Math.min(y0, y1), Math.abs(x1 - x0), Math.abs(y1 - y0));
        ctx.globalAlpha = layer.fillOpacity;
        ctx.fillStyle = layer.fill;
        ctx.fill();
        if (layer.stroke) {
          ctx.globalAlpha = layer.strokeOpacity ?? 1;
          ctx.strokeStyle = layer.stroke;
          ctx.lineWidth = p.dpr;
          ctx.stroke();
        }
        break;
      }
      case 'rule': {
        ctx.beginPath();
        if (layer.axis === 'x') {
          const x = p.x(layer.at);
          ctx.moveTo(x, p.top);
          ctx.lineTo(x, p.top + p.height);
        } else {
          const y = p.y(layer.at);
          ctx.moveTo(p.left, y);
          ctx.lineTo(p.left + p.width, y);
        }
        stroke(ctx, p, layer.color, layer.width, layer.dash);
        if (layer.label && layer.axis === 'y') {
          ctx.globalAlpha = 1;
          ctx.font = labelFont.replace(/^(\d+)px/, (_, px: string) => `${Number(px) * p.dpr}px`);
          ctx.fillStyle = axisColor;
          ctx.textAlign = 'right';
          ctx.textBaseline = layer.label.below ? 'top' : 'bottom';
          ctx.fillText(layer.label.text, p.left + p.width - 4 * p.dpr, p.y(layer.at) + (layer.label.below ? 3 : -3) * p.dpr);
        }
        break;
      }
    }
    ctx.globalAlpha = 1;
  }
  return markers;
}

/** The nearest point with a tip within `reach` CSS pixels of (cx, cy), in CSS pixels of the plot area. */
export function nearestTip(
  layers: readonly ChartLayer[],
  at: (x: number, y: number) => [number, number],
  cx: number,
  cy: number,
  reach = 10,
): { text: string; x: number; y: number } | null {
  let best: { text: string; x: number; y: number } | null = null;
  let bestD = reach * reach;
  for (const layer of layers) {
    if (layer.kind !== 'points' || !layer.tips) continue;
    for (let i = 0; i < layer.xs.length; i++) {
      const [x, y] = at(layer.xs[i]!, layer.ys[i]!);
      const d = (x - cx) ** 2 + (y - cy) ** 2;
      if (d <= bestD) {
        bestD = d;
        best = { text: layer.tips[i] ?? '', x, y };
      }
    }
  }
  return best;
}
