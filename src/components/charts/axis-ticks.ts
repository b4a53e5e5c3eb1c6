// Tick positions people can read: whole decades on log axes, 1-2-5 steps on linear ones.

/** Powers of ten covering [min, max], for a log axis domain and its ticks. */
export function decadeTicks(min: number, max: number): number[] {
  const lo = Math.floor(Math.log10(min));
  const hi = Math.max(lo + 1, Math.ceil(Math.log10(max)));
  return Array.from({ length: hi - lo + 1 }, (_, i) => Number((10 ** (lo + i)).toPrecision(1)));
}

/** A 1, 2 or 5 × 10ᵏ step close to `raw`. */
export function niceStep(raw: number): number {
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}

/** Ticks from lo to hi (both multiples of step). */
export function stepTicks(lo: number, hi: number, step: number): number[] {
  return Array.from({ length: Math.round((hi - lo) / step) + 1 }, (_, i) => Number((lo + i * step).toPrecision(12)));
}
