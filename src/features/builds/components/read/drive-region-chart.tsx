import { useMemo } from 'react';
import { formatShort } from '@shared/format/measured-number.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

interface PlanePoint {
  xNm: number;
  yNm: number;
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

const cornersText = (ps: readonly PlanePoint[]) => ps.map((p) => `(${formatShort(p.xNm)}, ${formatShort(p.yNm)})`).join(', ') + ' nm';

/** A small plot of the positions a saved drive matrix reaches within its limits, with the rest position (x₀, y₀). */
export function DriveRegionChart({ region, rest }: { region: readonly PlanePoint[]; rest: PlanePoint }) {
  const chart = useMemo(() => {
    const d = squareAxes([...region, rest]);
    return {
      x: { label: 'x (nm)', domain: d.x, ticks: d.xTicks },
      y: { label: 'y (nm)', domain: d.y, ticks: d.yTicks },
      layers: [
        {
          kind: 'polygon' as const,
          xs: region.map((p) => p.xNm),
          ys: region.map((p) => p.yNm),
          fill: chartColors.teal,
          fillOpacity: 0.14,
          stroke: chartColors.teal,
          width: 1.5,
        },
        { kind: 'points' as const, xs: [rest.xNm], ys: [rest.yNm], color: chartColors.ink, radius: 3 },
      ],
      legend: [
        { label: 'Reachable region', swatch: { kind: 'area' as const, fill: chartColors.teal, stroke: chartColors.teal } },
        { label: 'Rest position', swatch: { kind: 'marker' as const, marker: 'circle' as const, color: chartColors.ink } },
      ],
      figures: [
        { label: 'Reachable region, corners', value: cornersText(region) },
        { label: 'Rest position', value: cornersText([rest]) },
      ],
    };
  }, [region, rest]);
  return <UplotChart {...chart} height={360} square />;
}
