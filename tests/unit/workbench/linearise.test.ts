import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { evaluatePolynomial, fitPolynomial, PolynomialFitError } from '../../../shared/workbench/polynomial-fit.ts';
import { chooseDegree, linearise, LineariseError } from '../../../shared/workbench/linearise.ts';
import { lineariseInput } from '../../../shared/schemas/linearise.ts';
import { driveTableC, driveTableCsv } from '../../../shared/export/drive-table.ts';

/** NIST StRD Pontius: data and certified values read from the file itself. */
function pontius() {
  const text = readFileSync(new URL('../../fixtures/Pontius.dat', import.meta.url), 'utf8');
  const rows = text
    .split('Data:')
    .at(-1)!
    .split('\n')
    .map((l) => l.trim().split(/\s+/).map(Number))
    .filter((r) => r.length === 2 && r.every(Number.isFinite));
  const cert = (name: string) => {
    const m = text.match(new RegExp(`${name}\\s+([-+.\\dE]+)\\s+([-+.\\dE]+)`))!;
    return [Number(m[1]), Number(m[2])] as const;
  };
  return {
    x: rows.map((r) => r[1]!),
    y: rows.map((r) => r[0]!),
    b: [cert('B0'), cert('B1'), cert('B2')],
    residualSd: Number(text.match(/Standard Deviation\s+([-+.\dE]+)/)![1]),
    r2: Number(text.match(/R-Squared\s+([-+.\dE]+)/)![1]),
  };
}

describe('polynomial fit', () => {
  test('Pontius (NIST StRD, quadratic, average difficulty): coefficients, their SDs, residual SD and R² to 1e-9 relative [S: NIST/ITL StRD Pontius]', () => {
    const d = pontius();
    expect(d.x).toHaveLength(40);
    const f = fitPolynomial(d.x, d.y, 2);
    f.coefficients.forEach((c, i) => expect(Math.abs(c / d.b[i]![0] - 1)).toBeLessThan(1e-9));
    f.coefficientStdErr.forEach((s, i) => expect(Math.abs(s / d.b[i]![1] - 1)).toBeLessThan(1e-9));
    expect(Math.abs(f.residualStd / d.residualSd - 1)).toBeLessThan(1e-9);
    expect(Math.abs(f.r2! - d.r2)).toBeLessThan(1e-12);
  });

  test('Wampler1 (NIST StRD, degree 5, exact coefficients all 1, x = 0…20): every coefficient 1 within 1e-8 and residual SD ~0 [S: NIST/ITL StRD Wampler1]', () => {
    const x = Array.from({ length: 21 }, (_, i) => i);
    const y = x.map((v) => 1 + v + v ** 2 + v ** 3 + v ** 4 + v ** 5);
    const f = fitPolynomial(x, y, 5);
    for (const c of f.coefficients) expect(Math.abs(c - 1)).toBeLessThan(1e-8);
    expect(f.residualStd / Math.max(...y)).toBeLessThan(1e-12);
  });

  test('when every x is equal, or there are too few points, then the fit refuses with its code [calc]', () => {
    expect(() => fitPolynomial([1, 1, 1, 1], [1, 2, 3, 4], 1)).toThrow(PolynomialFitError);
    expect(() => fitPolynomial([1, 2, 3], [1, 2, 3], 2)).toThrow(/at least 4 points/);
  });
});

/** A loop whose branches bend as a cubic does [calc, invented numbers]. */
const up = (v: number) => 80 * v - 0.4 * v ** 2 + 0.004 * v ** 3;
const down = (v: number) => up(v) + 0.3 * v * (100 - v);
const volts = Array.from({ length: 21 }, (_, i) => i * 5);
const loop = [
  ...volts.map((v) => ({ volts: v, displacement: up(v), sweep: 'up' as const })),
  ...[...volts].reverse().map((v) => ({ volts: v, displacement: down(v), sweep: 'down' as const })),
];

describe('linearisation', () => {
  test('when the loop is an exact cubic per branch, then "auto" picks degree 3 and the coefficients come back [calc]', () => {
    const r = linearise(lineariseInput.parse({ points: loop, displacementUnit: 'nm' }));
    expect(r.branches.up!.degree).toBe(3);
    expect(r.branches.down!.degree).toBe(3);
    r.branches.up!.coefficients.forEach((c, i) => expect(c).toBeCloseTo([0, 80, -0.4, 0.004][i]!, 8));
    expect(r.residualNonlinearityPctAfter).toBeLessThan(1e-8);
    expect(r.nonlinearityPctBefore).toBeGreaterThan(1);
  });

  test('when the table drives each branch, then the branch reaches every target within its residual [calc: inversion check]', () => {
    const noisy = loop.map((p, i) => ({ ...p, displacement: p.displacement + 3 * Math.sin(7.3 * i) }));
    const r = linearise(lineariseInput.parse({ points: noisy, displacementUnit: 'nm', degree: 3 }));
    const fitUp = fitPolynomial(
      noisy.filter((p) => p.sweep === 'up').map((p) => p.volts),
      noisy.filter((p) => p.sweep === 'up').map((p) => p.displacement),
      3,
    );
    expect(r.table.length).toBe(21);
    for (const [i, row] of r.table.entries()) {
      expect(Math.abs(evaluatePolynomial(fitUp, row.voltsUp!) - row.targetNm)).toBeLessThan(1e-6);
      // The true up branch at those volts is within a few residual SDs of the target.
      expect(Math.abs(up(row.voltsUp!) - row.targetNm)).toBeLessThan(4 * r.branches.up!.residualStdNm + 1e-9);
      // Inside the range the down branch lies above the up one, so it needs fewer volts for the same position.
      if (i > 0 && i < r.table.length - 1) expect(row.voltsDown).toBeLessThan(row.voltsUp!);
    }
  });

  test('when the auto degree is asked of a straight line with noise, then the F-test keeps degree 1 [S: partial F-test at 5 %, Draper & Smith]', () => {
    const v = Array.from({ length: 30 }, (_, i) => i);
    const x = v.map((q, i) => 50 * q + Math.sin(12.9898 * i) * 0.5);
    expect(chooseDegree(v, x).degree).toBe(1);
  });

  test('when a branch turns back within the range, then it is refused as not_monotonic [calc]', () => {
    const hump = Array.from({ length: 11 }, (_, i) => ({ volts: i * 10, displacement: -((i * 10 - 50) ** 2) }));
    expect(() => linearise(lineariseInput.parse({ points: hump, displacementUnit: 'nm', degree: 2 }))).toThrow(LineariseError);
  });
});

describe('drive table files', () => {
  test('when a two-branch table is written, then the CSV has target, up and down columns and the C array one float array each [calc]', () => {
    const rows = [
      { targetNm: 0, voltsUp: 0, voltsDown: 0 },
      { targetNm: 500, voltsUp: 6.25, voltsDown: 5.5 },
    ];
    expect(driveTableCsv(rows)).toBe('target_nm,volts_up,volts_down\n0,0,0\n500,6.25,5.5\n');
    const c = driveTableC(rows);
    expect(c).toContain('#define SCANWRIGHT_DRIVE_ROWS 2');
    expect(c).toContain('static const float scanwright_drive_volts_up[2] = {\n  0.0f, 6.25f\n};');
    expect(c).not.toContain('volts[');
    expect(c).toContain('scanwright_drive_target_nm[2] = {\n  0.0f, 500.0f\n};');
  });
});
