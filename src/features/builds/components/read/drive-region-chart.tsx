import { useMemo } from 'react';
import { planePointsText, squareAxes, tickDomain, type PlanePoint } from '@/components/charts/plane-axes.ts';
import { chartColors } from '@/components/charts/chart-theme.ts';
import { UplotChart } from '@/components/charts/uplot-chart.tsx';

/** A small plot of the positions a saved drive matrix reaches within its limits, with the rest position (x₀, y₀). */
export function DriveRegionChart({ region, rest }: { region: readonly PlanePoint[]; rest: PlanePoint }) {
  const chart = useMemo(() => {
    // A small plot beside the matrix: two divisions keep its tick figures apart.
    const axes = squareAxes([...region, rest], 2);
    return {
      x: { label: 'x (nm)', domain: tickDomain(axes.x), ticks: axes.x },
      y: { label: 'y (nm)', domain: tickDomain(axes.y), ticks: axes.y },
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
        { label: 'Reachable region, corners', value: planePointsText(region) },
        { label: 'Rest position', value: planePointsText([rest]) },
      ],
    };
  }, [region, rest]);
  return <UplotChart {...chart} height={360} square />;
}
