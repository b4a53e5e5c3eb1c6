// Student t quantiles for the 95 % interval on a fitted gain.
//
// Method (published algorithms; equation and section numbers are [memory], the results are
// checked against the printed NIST/SEMATECH table and by quadrature in the tests):
// - The two-sided tail of Student's t is a regularized incomplete beta function,
//   P(|T| > t) = I_x(ν/2, 1/2) with x = ν/(ν + t²) (Abramowitz & Stegun 26.7.1 / 26.5.27),
//   evaluated by the continued fraction A&S 26.5.8 with the modified Lentz method, as in
//   Numerical Recipes (Press et al., 2nd ed. 1992, §6.4 betai/betacf).
// - The quantile solves tail(t) = 2(1 − p) by Newton's method (derivative −2·pdf), safeguarded by
//   bisection, started from the Cornish–Fisher expansion A&S 26.7.5. For ν > 1000 the expansion
//   itself is returned: its first omitted term is O(ν⁻⁵) < 1e-13.
// - The normal quantile (ν = ∞) inverts erfc(z/√2) = Q(1/2, z²/2), the regularized incomplete
//   gamma of Numerical Recipes §6.2 (gser/gcf), by the same Newton scheme from A&S 26.2.23.
// - ln Γ: Lanczos (1964) approximation, g = 7, n = 9 (coefficients as tabulated by P. Godfrey).

const EPS = 1e-16;
const FPMIN = 1e-300;
const MAX_ITERATIONS = 10000;
const CORNISH_FISHER_MIN_DF = 1000;

const LANCZOS_G = 7;
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059, 12.507343278686905,
  -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

/** ln Γ(x) for x > 0; the normalising constants of the t and normal tails need it. */
export function lnGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * x))) - lnGamma(1 - x);
  const z = x - 1;
  let sum = LANCZOS[0];
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i] / (z + i);
  const t = z + LANCZOS_G + 0.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

// Continued fraction for I_x(a, b) (A&S 26.5.8; NR betacf, modified Lentz).
function betaContinuedFraction(a: number, b: number, x: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < FPMIN) d = FPMIN;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = 1 + aa / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = 1 + aa / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) return h;
  }
  return h;
}

// I_x(a, b) given x and y = 1 − x separately (both computed without cancellation by the caller).
function regularizedBeta(a: number, b: number, x: number, y: number, lnX: number, lnY: number): number {
  if (x <= 0) return 0;
  if (y <= 0) return 1;
  const lnFront = lnGamma(a + b) - lnGamma(a) - lnGamma(b) + a * lnX + b * lnY;
  const front = Math.exp(lnFront);
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, y)) / b;
}

/** Two-sided tail P(|T| > t) of Student's t with df degrees of freedom, via I_x(ν/2, 1/2). */
export function studentTTwoSidedTail(t: number, df: number): number {
  if (!Number.isFinite(df)) return normalTwoSidedTail(t);
  const t2 = t * t;
  const x = df / (df + t2);
  const y = t2 / (df + t2);
  return regularizedBeta(df / 2, 0.5, x, y, -Math.log1p(t2 / df), Math.log(y));
}

function studentTDensity(t: number, df: number): number {
  const lnC = lnGamma((df + 1) / 2) - lnGamma(df / 2) - 0.5 * Math.log(df * Math.PI);
  return Math.exp(lnC - ((df + 1) / 2) * Math.log1p((t * t) / df));
}

// Regularized upper incomplete gamma Q(a, x) (NR §6.2: series for x < a + 1, else Lentz CF).
function upperIncompleteGamma(a: number, x: number): number {
  if (x <= 0) return 1;
  const lnFront = -x + a * Math.log(x) - lnGamma(a);
  if (x < a + 1) {
    let ap = a;
    let del = 1 / a;
    let sum = del;
    for (let n = 0; n < MAX_ITERATIONS; n++) {
      ap += 1;
      del *= x / ap;
      sum += del;
      if (Math.abs(del) < Math.abs(sum) * EPS) break;
    }
    return 1 - sum * Math.exp(lnFront);
  }
  let b = x + 1 - a;
  let c = 1 / FPMIN;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i <= MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = b + an / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return Math.exp(lnFront) * h;
}

/** Two-sided normal tail P(|Z| > z) = erfc(z/√2) = Q(1/2, z²/2); the ν = ∞ limit of the t tail. */
export function normalTwoSidedTail(z: number): number {
  return upperIncompleteGamma(0.5, (z * z) / 2);
}

// Solves tail(t) = alpha for t ≥ 0 where tail decreases from 1 at t = 0: Newton from `guess`,
// falling back to bisection whenever a step leaves the bracket.
function invertTail(tail: (t: number) => number, density: (t: number) => number, alpha: number, guess: number): number {
  let lo = 0;
  let hi = Math.max(guess, 1);
  while (tail(hi) > alpha) {
    lo = hi;
    hi *= 2;
  }
  let t = guess > lo && guess < hi ? guess : (lo + hi) / 2;
  for (let i = 0; i < 200; i++) {
    const f = tail(t) - alpha;
    if (f === 0) return t;
    if (f > 0) lo = t;
    else hi = t;
    const step = f / (2 * density(t));
    let next = t + step;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (Math.abs(next - t) <= 1e-15 * Math.abs(next) || hi - lo <= 1e-15 * hi) return next;
    t = next;
  }
  return t;
}

function normalDensity(z: number): number {
  return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
}

/** Standard normal quantile z(p), 0 < p < 1; the ν = ∞ row of the t table. */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError('p must be strictly between 0 and 1');
  if (p === 0.5) return 0;
  const upper = p > 0.5;
  const alpha = 2 * (upper ? 1 - p : p);
  // Starting value: A&S 26.2.23 rational approximation (|error| < 4.5e-4), refined by Newton.
  const w = Math.sqrt(-2 * Math.log(alpha / 2));
  const guess = w - (2.515517 + 0.802853 * w + 0.010328 * w * w) / (1 + 1.432788 * w + 0.189269 * w * w + 0.001308 * w * w * w);
  const z = invertTail(normalTwoSidedTail, normalDensity, alpha, guess);
  return upper ? z : -z;
}

// Cornish–Fisher expansion of the t quantile in powers of 1/ν (A&S 26.7.5).
function cornishFisher(z: number, df: number): number {
  const z2 = z * z;
  const g1 = (z * (z2 + 1)) / 4;
  const g2 = (z * ((5 * z2 + 16) * z2 + 3)) / 96;
  const g3 = (z * (((3 * z2 + 19) * z2 + 17) * z2 - 15)) / 384;
  const g4 = (z * ((((79 * z2 + 776) * z2 + 1482) * z2 - 1920) * z2 - 945)) / 92160;
  return z + (g1 + (g2 + (g3 + g4 / df) / df) / df) / df;
}

/** Quantile t(p, df) of Student's t for 0 < p < 1 and any real df ≥ 1 (df = Infinity allowed). */
export function studentTQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError('p must be strictly between 0 and 1');
  if (!(df >= 1)) throw new RangeError('degrees of freedom must be at least 1');
  if (p === 0.5) return 0;
  const z = normalQuantile(p);
  if (!Number.isFinite(df)) return z;
  if (df > CORNISH_FISHER_MIN_DF) return cornishFisher(z, df);
  const upper = p > 0.5;
  const alpha = 2 * (upper ? 1 - p : p);
  const t = invertTail(
    (v) => studentTTwoSidedTail(v, df),
    (v) => studentTDensity(v, df),
    alpha,
    Math.abs(cornishFisher(z, Math.max(df, 3))),
  );
  return upper ? t : -t;
}

/** t(0.975, df): the multiplier for a two-sided 95 % confidence interval. */
export function tCritical95(df: number): number {
  return studentTQuantile(0.975, df);
}
