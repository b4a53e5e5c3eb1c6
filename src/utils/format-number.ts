// Number formatting for measured values: significant figures, and a value rounded to the
// decimal place of its uncertainty (uncertainty kept to two significant figures).

const DASH = '—';
const isFiniteNumber = (v: number | null | undefined): v is number => typeof v === 'number' && Number.isFinite(v);

/** A value to `sig` significant figures without trailing zeros (104, 23.5, 5.8, 0.0123), so cards stay short. */
export function formatSig(value: number | null | undefined, sig = 3): string {
  if (!isFiniteNumber(value)) return DASH;
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(sig));
  const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
  const decimals = Math.min(12, Math.max(0, sig - 1 - magnitude));
  return String(Number(rounded.toFixed(decimals)));
}

/** A value to a fixed number of decimals, or a dash when it is missing. */
export function formatFixed(value: number | null | undefined, decimals: number): string {
  return isFiniteNumber(value) ? value.toFixed(decimals) : DASH;
}

/**
 * A value and its uncertainty as strings with the same number of decimals, the uncertainty to two
 * significant figures (104.2 and 1.3; 23 and 12). Without a usable uncertainty the value gets three.
 */
export function formatWithUncertainty(value: number, uncertainty: number | null | undefined): { value: string; uncertainty: string | null } {
  if (!isFiniteNumber(value)) return { value: DASH, uncertainty: null };
  if (!isFiniteNumber(uncertainty) || uncertainty <= 0) return { value: formatSig(value, 3), uncertainty: null };
  const u = Number(uncertainty.toPrecision(2));
  const decimals = Math.min(12, Math.max(0, 1 - Math.floor(Math.log10(u))));
  return { value: value.toFixed(decimals), uncertainty: u.toFixed(decimals) };
}
