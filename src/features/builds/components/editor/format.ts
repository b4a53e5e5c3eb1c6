import { formatShort, formatWithUncertainty } from '@shared/format/measured-number.ts';

/** A measured number to `digits` significant figures, with a true minus sign. */
export const sig = (value: number | null | undefined, digits = 3) => formatShort(value, digits).replace('-', '−');

/** "96.3 ± 2.1": the value rounded to the place its uncertainty is quoted to. */
export function withUncertainty(value: number, halfWidth: number): string {
  const f = formatWithUncertainty(value, halfWidth);
  return (f.uncertainty === null ? f.value : `${f.value} ± ${f.uncertainty}`).replace(/-/g, '−');
}

/** The 95 % interval as "94.2 to 98.4" at the rounding of its half-width. */
export function interval([lo, hi]: [number, number]): string {
  const half = (hi - lo) / 2;
  const a = formatWithUncertainty(lo, half).value;
  const b = formatWithUncertainty(hi, half).value;
  return `${a} to ${b}`.replace(/-/g, '−');
}

/** A percentage of span, or a dash when it could not be computed. */
export const pct = (value: number | null) => (value === null ? '—' : `${sig(value, 2)} %`);

/** R² to four decimals, or a dash. */
export const r2 = (value: number | null) => (value === null ? '—' : value.toFixed(4));
