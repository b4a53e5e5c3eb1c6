// One way to print a measured or computed number anywhere in the app (pages, mails, exports): a
// few significant figures, a proper minus sign, grouped thousands, powers of ten outside
// 10⁻³…10⁶, SI prefixes where a unit scales, and a value with its uncertainty rounded as the GUM
// recommends (the uncertainty to two significant figures, the value to the same decimal place)
// [S: GUM, JCGM 100:2008, 7.2.6], always saying which ± it is. Pure; components render `value` in
// the monospace `num` class and `unit` beside it.

/** A number ready to print: the digits and the unit that goes after them. */
export interface Formatted {
  value: string;
  unit: string;
}

const MINUS = '\u2212';
const GROUP = '\u202F';
const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
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
 * decimal place (102.6 ± 1.3; 23 ± 12; 100.0000 ± 0.0012) [S: GUM 7.2.6]. Without a usable
 * uncertainty the value gets 4 significant figures and `uncertainty` is null.
 */
export function formatWithUncertainty(
  value: number,
  uncertainty: number | null | undefined,
): { value: string; uncertainty: string | null } {
  if (value === null || value === undefined || !Number.isFinite(value)) return { value: '—', uncertainty: null };
  if (uncertainty === null || uncertainty === undefined || !(uncertainty > 0) || !Number.isFinite(uncertainty)) {
    return { value: formatSig(value), uncertainty: null };
  }
  const u2 = Number(uncertainty.toPrecision(2));
  const place = Math.floor(Math.log10(u2)) - 1; // decimal exponent of the uncertainty's second figure
  if (place >= 0) {
    // Uncertainty ≥ 10: round both to that power of ten, print as integers.
    const step = 10 ** place;
    return { value: formatFixed(Math.round(value / step) * step, 0), uncertainty: formatFixed(Math.round(u2 / step) * step, 0) };
  }
  const decimals = Math.min(15, -place);
  return { value: formatFixed(value, decimals), uncertainty: formatFixed(u2, decimals) };
}

/** Which ± a figure carries: a 95 % interval (Student t) or a standard uncertainty (k = 1, GUM). */
export type PlusMinusKind = 'ci95' | 'std';

/** The words that follow a ± so the two kinds never look alike. */
export const plusMinusLabels: Readonly<Record<PlusMinusKind, { short: string; long: string }>> = {
  ci95: { short: '95 %', long: 'half-width of the 95 % interval (Student t)' },
  std: { short: 'u, k = 1', long: 'standard uncertainty (k = 1, GUM)' },
};

/** A value ± uncertainty with its unit and kind as one string: "102.7 ± 0.4 nm/V (95 %)". */
/** A unit after a number: a space before it, except the degree sign, which sits on the number (12.5°) [S: SI Brochure, 9th ed., §5.4.3]. */
export const unitSuffix = (unit: string) => (!unit ? '' : unit === '°' ? '°' : ` ${unit}`);

export function formatPlusMinus(value: number, uncertainty: number | null | undefined, kind: PlusMinusKind, unit = 'nm/V'): string {
  const f = formatWithUncertainty(value, uncertainty);
  const u = unitSuffix(unit);
  return f.uncertainty === null ? `${f.value}${u}` : `${f.value} ± ${f.uncertainty}${u} (${plusMinusLabels[kind].short})`;
}

/** A short figure for cards and tables: `sig` significant figures without trailing zeros (104, 23.5, 0.0123). */
export function formatShort(value: number | null | undefined, sig = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return formatSig(Number(value.toPrecision(sig)), sig)
    .replace(/(\.\d*?)0+($|\s)/, '$1$2')
    .replace(/\.($|\s)/, '$1');
}

const PREFIXES: readonly (readonly [number, string])[] = [
  [1e-12, 'p'],
  [1e-9, 'n'],
  [1e-6, 'µ'],
  [1e-3, 'm'],
  [1, ''],
  [1e3, 'k'],
  [1e6, 'M'],
  [1e9, 'G'],
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

/** A figure printed by this module as plain ASCII for files (CSV): ASCII minus, no digit grouping, 1.2e-5 for powers of ten. */
export function plainFigure(printed: string): string {
  if (printed === '—') return '';
  const sup = Object.fromEntries(Object.entries(SUPERSCRIPT).map(([k, v]) => [v, k]));
  return printed
    .replace(/\u2212/g, '-')
    .replace(/\u202F/g, '')
    .replace(/ × 10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/, (_m, e: string) => `e${[...e].map((c) => sup[c] ?? c).join('')}`);
}
