import type { Marker } from './chart-layers.ts';
import { legendClass } from './chart-theme.ts';

/** What a legend entry shows beside its words: a marker, a line or an area, as drawn on the chart. */
export type LegendSwatch =
  | { kind: 'marker'; marker: Marker; color: string; outline?: string; opacity?: number }
  | { kind: 'line'; color: string; dash?: boolean; width?: number }
  | { kind: 'area'; fill: string; stroke: string; median?: string };

export interface LegendItem {
  label: string;
  swatch: LegendSwatch;
}

function Swatch({ swatch }: { swatch: LegendSwatch }) {
  switch (swatch.kind) {
    case 'marker': {
      const shape = {
        circle: <circle cx="6" cy="6" r="4" />,
        triangle: <path d="M6 1.5 10.5 10H1.5z" />,
        diamond: <path d="M6 0.5 11.5 6 6 11.5 0.5 6z" />,
        cross: <path d="M2 2l8 8M10 2l-8 8" strokeWidth="2" stroke={swatch.color} />,
      }[swatch.marker];
      return (
        <svg width="12" height="12" aria-hidden="true" fill={swatch.color} fillOpacity={swatch.opacity} stroke={swatch.outline}>
          {shape}
        </svg>
      );
    }
    case 'line':
      return (
        <svg width="18" height="12" aria-hidden="true">
          <path d="M1 6h16" stroke={swatch.color} strokeWidth={swatch.width ?? 1.5} strokeDasharray={swatch.dash ? '4 3' : undefined} />
        </svg>
      );
    case 'area':
      return (
        <svg width="18" height="12" aria-hidden="true">
          <rect x="1" y="1" width="16" height="10" fill={swatch.fill} fillOpacity="0.15" stroke={swatch.stroke} />
          {swatch.median && <path d="M9 0v12" stroke={swatch.median} strokeWidth="2" />}
        </svg>
      );
  }
}

/** A chart's legend in HTML at the page's small text size, each entry with the mark the chart draws. */
export function ChartLegend({ items }: { items: readonly LegendItem[] }) {
  if (items.length === 0) return null;
  return (
    <ul className={legendClass} aria-label="Legend">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-1.5">
          <Swatch swatch={item.swatch} />
          {item.label}
        </li>
      ))}
    </ul>
  );
}
