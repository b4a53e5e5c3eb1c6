// One way to print a measured or computed number on the workbench: a few significant figures, a
// proper minus sign, grouped thousands, powers of ten outside 10⁻³…10⁶, and SI prefixes where a
// unit scales. Components render `value` in the monospace `num` class and `unit` beside it.

/** A number ready to print: the digits and the unit that goes after them. */
export interface Formatted {
  value: string;
  unit: string;
}

const MINUS = '\u2212';
const GROUP = '\u202F';
const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

const superscript = (n: number) => String(n).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);

function group(digits: string): string {
  const [int, frac] = digits.split('.');
  const grouped = int.length > 4 ? int.replace(/\B(?=(\d{3})+(?!\d))/g, GROUP) : int;
  return frac === undefined ? grouped : `${grouped}.${frac}`;
}

/** `value` to `sig` significant figures (default 4); '—' for a missing or non-finite value. */
export function formatSig(value: number | null | undefined, sig = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const rounded = Number(Math.abs(value).toPrecision(sig));
  const exp = Math.floor(Math.log10(rounded));
  const body =
    exp >= 6 || exp < -3
      ? `${(rounded / 10 ** exp).toFixed(sig - 1)} × 10${superscript(exp)}`
      : group(rounded.toFixed(Math.max(0, sig - 1 - exp)));
  return value < 0 ? `${MINUS}${body}` : body;
}

/** Fixed decimals with the same minus sign and grouping (R², percentages of a fixed resolution). */
export function formatFixed(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const body = group(Math.abs(value).toFixed(decimals));
  return value < 0 && Number(body.replace(/\D/g, '')) !== 0 ? `${MINUS}${body}` : body;
}

/**
 * A value with its uncertainty: the uncertainty to 2 significant figures and the value to the same
 * decimal place (102.6 ± 1.3). When the uncertainty is negligible, each gets its own figures.
 */
export function formatWithUncertainty(value: number, uncertainty: number | null | undefined): { value: string; uncertainty: string | null } {
  if (uncertainty === null || uncertainty === undefined || !(uncertainty > 0) || !Number.isFinite(uncertainty)) {
    return { value: formatSig(value), uncertainty: null };
  }
  if (value !== 0 && uncertainty / Math.abs(value) < 1e-5) {
    return { value: formatSig(value, 6), uncertainty: formatSig(uncertainty, 2) };
  }
  const decimals = Math.max(0, 1 - Math.floor(Math.log10(Number(uncertainty.toPrecision(2)))));
  return { value: formatFixed(value, decimals), uncertainty: formatFixed(uncertainty, decimals) };
}

const PREFIXES: readonly (readonly [number, string])[] = [
  [1e-12, 'p'], [1e-9, 'n'], [1e-6, 'µ'], [1e-3, 'm'], [1, ''], [1e3, 'k'], [1e6, 'M'], [1e9, 'G'],
];

/**
 * A value in a base SI unit printed with the prefix that keeps 1 ≤ digits < 1000 ('2.136 mA').
 * `range` limits the prefixes (lengths never go below nm, for instance).
 */
export function formatSi(value: number | null | undefined, unit: string, sig = 4, range: [string, string] = ['p', 'G']): Formatted {
  if (value === null || value === undefined || !Number.isFinite(value)) return { value: '—', unit };
  const lo = PREFIXES.findIndex(([, p]) => p === range[0]);
  const hi = PREFIXES.findIndex(([, p]) => p === range[1]);
  const abs = Math.abs(value);
  let i = lo;
  while (i < hi && abs > 0 && Number((abs / PREFIXES[i + 1][0]).toPrecision(sig)) >= 1) i++;
  const [factor, prefix] = abs === 0 ? [1, ''] : PREFIXES[i];
  return { value: formatSig(value / factor, sig), unit: `${prefix}${unit}` };
}

/** A displacement given in nm, shown in nm, µm or mm, whichever reads best. */
export function formatLengthNm(valueNm: number | null | undefined, sig = 4): Formatted {
  return formatSi(valueNm === null || valueNm === undefined ? valueNm : valueNm * 1e-9, 'm', sig, ['n', '']);
}

/** A duration in seconds: µs and ms below a second, then s, then minutes and seconds. */
export function formatDuration(seconds: number | null | undefined): Formatted {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return { value: '—', unit: 's' };
  if (seconds < 120) return formatSi(seconds, 's', 4, ['n', '']);
  if (seconds < 7200) {
    const m = Math.floor(seconds / 60);
    return { value: `${m} min ${formatFixed(seconds - m * 60, 0)}`, unit: 's' };
  }
  return { value: formatSig(seconds / 3600, 3), unit: 'h' };
}

/** A coefficient of determination: five decimals near 1, where the digits that matter are. */
export function formatR2(r2: number | null | undefined): string {
  if (r2 === null || r2 === undefined) return '—';
  return r2 >= 0.99 ? formatFixed(r2, 5) : formatFixed(r2, 3);
}

/** An axis tick: up to 4 significant figures with trailing zeros dropped ('0.5', '1200'). */
export function formatTick(value: number): string {
  const s = formatSig(value, 4);
  return s.includes('.') && !s.includes('×') ? s.replace(/\.?0+$/, '') : s;
}

/** A time as a short label: '10 s', '16 min 40 s', '1 h'. */
export function formatTimeLabel(seconds: number): string {
  if (seconds < 120) return `${formatTick(seconds)} s`;
  if (seconds < 7200) {
    const m = Math.floor(seconds / 60);
    const s = Math.round(seconds - m * 60);
    return s === 0 ? `${m} min` : `${m} min ${s} s`;
  }
  return `${formatTick(Number((seconds / 3600).toPrecision(3)))} h`;
}
