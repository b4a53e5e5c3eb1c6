import type { GainHistogramDto } from '@shared/schemas/part.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import type { GainScale } from './gain-scale.ts';

const W = 1000;
const H = 100;

/**
 * Bars of how many listed parts have their median gain in each log-spaced bin, with the chosen
 * range shaded; bars inside it in copper. Drawn by hand (no chart library on the registry page).
 */
export function GainHistogram({
  histogram,
  scale,
  min,
  max,
}: {
  histogram: GainHistogramDto;
  scale: GainScale;
  min?: number;
  max?: number;
}) {
  const peak = Math.max(1, ...histogram.bins.map((b) => b.count));
  const total = histogram.bins.reduce((n, b) => n + b.count, 0);
  const bandsText = histogram.bins.map((b) => `${b.count} from ${formatShort(b.fromNmPerV)} to ${formatShort(b.toNmPerV)} nm/V`).join('; ');
  const x = (g: number) => scale.fraction(g) * W;
  const left = min !== undefined ? x(min) : 0;
  const right = max !== undefined ? x(max) : W;
  const inside = (from: number, to: number) => (min === undefined || to > min) && (max === undefined || from < max);
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      preserveAspectRatio="none"
      className="block h-16 w-full"
      role="img"
      aria-label={`Where listed parts cluster: ${total} median gains between ${formatShort(10 ** scale.lo)} and ${formatShort(10 ** scale.hi)} nm/V, log scale. ${bandsText}`}
    >
      <rect x={left} y="0" width={Math.max(0, right - left)} height={H} fill="#2F6F73" fillOpacity="0.1" />
      {scale.decades.map((d) => (
        <line key={d} x1={x(d)} x2={x(d)} y1="0" y2={H} stroke="#D8D3C8" strokeWidth="2" vectorEffect="non-scaling-stroke" />
      ))}
      {histogram.bins.map((b) => {
        const h = (b.count / peak) * (H - 8);
        return (
          <rect
            key={b.fromNmPerV}
            x={x(b.fromNmPerV) + 2}
            y={H - h}
            width={Math.max(2, x(b.toNmPerV) - x(b.fromNmPerV) - 4)}
            height={h}
            fill={inside(b.fromNmPerV, b.toNmPerV) ? '#B5532A' : '#4A525C'}
            fillOpacity={inside(b.fromNmPerV, b.toNmPerV) ? 0.9 : 0.35}
          >
            <title>{`${formatShort(b.fromNmPerV, 2)}–${formatShort(b.toNmPerV, 2)} nm/V: ${b.count} part${b.count === 1 ? '' : 's'}`}</title>
          </rect>
        );
      })}
      <line x1="0" x2={W} y1={H - 0.5} y2={H - 0.5} stroke="#4A525C" strokeWidth="1" vectorEffect="non-scaling-stroke" />
    </svg>
  );
}
