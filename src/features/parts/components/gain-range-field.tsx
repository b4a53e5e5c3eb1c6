import type { GainHistogramDto } from '@shared/schemas/part.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { GainHistogram } from './gain-histogram.tsx';
import { gainScale } from './gain-scale.ts';
import { fieldClass, labelClass } from '@/components/search/filter-styles.ts';

const thumb =
  'pointer-events-none absolute inset-x-0 top-0 h-6 w-full appearance-none bg-transparent focus-visible:outline-none ' +
  '[&::-webkit-slider-thumb]:pointer-events-auto [&::-webkit-slider-thumb]:h-5 [&::-webkit-slider-thumb]:w-5 ' +
  '[&::-webkit-slider-thumb]:cursor-pointer [&::-webkit-slider-thumb]:appearance-none ' +
  '[&::-webkit-slider-thumb]:rounded-full [&::-webkit-slider-thumb]:border-2 ' +
  '[&::-webkit-slider-thumb]:border-white [&::-webkit-slider-thumb]:bg-copper [&::-webkit-slider-thumb]:shadow ' +
  'focus-visible:[&::-webkit-slider-thumb]:ring-4 focus-visible:[&::-webkit-slider-thumb]:ring-copper/40 ' +
  '[&::-moz-range-thumb]:pointer-events-auto [&::-moz-range-thumb]:h-4 [&::-moz-range-thumb]:w-4 ' +
  '[&::-moz-range-thumb]:cursor-pointer [&::-moz-range-thumb]:rounded-full [&::-moz-range-thumb]:border-2 ' +
  '[&::-moz-range-thumb]:border-white [&::-moz-range-thumb]:bg-copper';

const parse = (text: string) => (text.trim() === '' || !Number.isFinite(Number(text)) ? undefined : Number(text));

/**
 * The median-gain range: two number fields (nm/V) and, over the histogram of every accepted median,
 * two sliders on a log scale. A slider at its far end means "no limit". `onCommit` runs when a slider is let go.
 */
export function GainRangeField({
  histogram,
  minText,
  maxText,
  onChange,
  onCommit,
}: {
  histogram: GainHistogramDto | undefined;
  minText: string;
  maxText: string;
  onChange: (minText: string, maxText: string) => void;
  onCommit: () => void;
}) {
  const scale = gainScale(histogram);
  const min = parse(minText);
  const max = parse(maxText);
  const minPos = min === undefined ? 0 : scale.positionOf(min);
  const maxPos = max === undefined ? scale.steps : scale.positionOf(max);
  const release = {
    onPointerUp: onCommit,
    onKeyUp: (e: { key: string }) => {
      if (e.key.startsWith('Arrow') || e.key === 'Home' || e.key === 'End' || e.key.startsWith('Page')) onCommit();
    },
  };
  return (
    <fieldset className="min-w-0 sm:col-span-2">
      <legend className={labelClass}>Median gain (nm/V)</legend>
      <div className="rounded-md border border-rule bg-paper px-3 pt-2 pb-1">
        <div className="mx-2.5">
          {histogram ? (
            <GainHistogram histogram={histogram} scale={scale} min={min} max={max} />
          ) : (
            <div className="h-16" aria-hidden="true" />
          )}
        </div>
        <div className="relative h-6">
          <div aria-hidden="true" className="absolute inset-x-2.5 top-[11px] h-0.5 rounded bg-rule" />
          <input
            type="range"
            min={0}
            max={scale.steps}
            value={minPos}
            className={`${thumb} ${minPos === maxPos && minPos > scale.steps / 2 ? 'z-10' : ''}`}
            aria-label="Lower end of the gain range"
            aria-valuetext={min === undefined ? 'no lower limit' : `${formatShort(min)} nm/V`}
            onChange={(e) => {
              const p = Math.min(Number(e.target.value), maxPos);
              onChange(p === 0 ? '' : String(scale.gainAt(p)), maxText);
            }}
            {...release}
          />
          <input
            type="range"
            min={0}
            max={scale.steps}
            value={maxPos}
            className={thumb}
            aria-label="Upper end of the gain range"
            aria-valuetext={max === undefined ? 'no upper limit' : `${formatShort(max)} nm/V`}
            onChange={(e) => {
              const p = Math.max(Number(e.target.value), minPos);
              onChange(minText, p === scale.steps ? '' : String(scale.gainAt(p)));
            }}
            {...release}
          />
        </div>
        <div aria-hidden="true" className="relative mx-2.5 h-4 text-[11px] text-ink-soft">
          {scale.decades.map((d, i) => (
            <span
              key={d}
              className={`num absolute ${i === 0 ? '' : i === scale.decades.length - 1 ? '-translate-x-full' : '-translate-x-1/2'}`}
              style={{ left: `${scale.fraction(d) * 100}%` }}
            >
              {formatShort(d)}
            </span>
          ))}
        </div>
      </div>
      <div className="mt-2 grid grid-cols-2 gap-2">
        <div>
          <label htmlFor="gain-min" className={labelClass}>
            Gain from (nm/V)
          </label>
          <input
            id="gain-min"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            value={minText}
            placeholder="any"
            className={`${fieldClass} num`}
            onChange={(e) => onChange(e.target.value, maxText)}
          />
        </div>
        <div>
          <label htmlFor="gain-max" className={labelClass}>
            Gain to (nm/V)
          </label>
          <input
            id="gain-max"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            value={maxText}
            placeholder="any"
            className={`${fieldClass} num`}
            onChange={(e) => onChange(minText, e.target.value)}
          />
        </div>
      </div>
    </fieldset>
  );
}
