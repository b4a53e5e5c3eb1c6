import { describe, expect, it } from 'vitest';
import { tubeInput } from '@shared/schemas/workbench-extras.ts';
import { tubeCalculator } from '@shared/workbench/calculators/tube-calculator.ts';
import { materials } from '@shared/workbench/materials.ts';
import { rectangularCantileverHz } from '@shared/workbench/resonance.ts';
import { annulusSection, axialModeHz, tubeBendingModeHz, tubeCapacitances } from '@shared/workbench/tube.ts';

const EPS0 = 8.8541878128e-12; // F/m, CODATA 2018
const pzt5h = materials['PZT-5H'];
// FIELD.md's tube: L 12.7, OD 6.35, wall 0.508 mm, PZT-5H (εr 3400, E 60.6 GPa, ρ 7500 kg/m³
// [S: Erturk & Inman 2011, App. E]).
const fieldTube = {
  lengthMm: 12.7,
  outerDiameterMm: 6.35,
  wallMm: 0.508,
  relPermittivity: pzt5h.relPermittivity33T,
  youngsModulusPa: pzt5h.youngsModulusGpa * 1e9,
  densityKgPerM3: pzt5h.densityKgPerM3,
};
const L = 12.7e-3;
const OD = 6.35e-3;
const ID = (6.35 - 2 * 0.508) * 1e-3;

/** Classical RK4 over s ∈ [0, 1] for y' = f(y); returns y(1). */
function rk4(f: (y: number[]) => number[], y0: number[], steps = 4000): number[] {
  const h = 1 / steps;
  let y = y0;
  const add = (a: number[], b: number[], k: number) => a.map((v, i) => v + k * b[i]);
  for (let i = 0; i < steps; i++) {
    const k1 = f(y);
    const k2 = f(add(y, k1, h / 2));
    const k3 = f(add(y, k2, h / 2));
    const k4 = f(add(y, k3, h));
    y = y.map((v, j) => v + (h / 6) * (k1[j] + 2 * k2[j] + 2 * k3[j] + k4[j]));
  }
  return y;
}

/** A sign change of g between lo and hi, narrowed by bisection. */
function bisect(g: (x: number) => number, lo: number, hi: number): number {
  let [a, b] = [lo, hi];
  const ga = Math.sign(g(a));
  expect(Math.sign(g(b))).toBe(-ga);
  for (let i = 0; i < 80; i++) {
    const m = (a + b) / 2;
    if (Math.sign(g(m)) === ga) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

describe('tube capacitance C = 2π·ε0·εr·L/ln(OD/ID) [memory, FIELD.md]; quadrant = C/4 [calc]', () => {
  it("when FIELD.md's tube is PZT-5H, then C follows the formula by hand and a quadrant is a quarter [calc]", () => {
    const whole = (2 * Math.PI * EPS0 * 3400 * L) / Math.log(OD / ID);
    const c = tubeCapacitances(fieldTube);
    expect(c.tubeCapacitanceF / whole).toBeCloseTo(1, 12);
    expect(c.quadrantCapacitanceF / (whole / 4)).toBeCloseTo(1, 12);
  });

  it("when FIELD.md's tube is PZT-5H, then a quadrant comes to 3.4 nF, the capacitance FIELD.md's drive-current check uses [calc]", () => {
    expect(tubeCapacitances(fieldTube).quadrantCapacitanceF * 1e9).toBeCloseTo(3.4, 1);
  });

  it('when the radial field is integrated numerically, 1/C = ∫ dr/(2π·ε·r·L), then it agrees [calc: independent route, Simpson]', () => {
    const n = 2000;
    const [a, b] = [ID / 2, OD / 2];
    const h = (b - a) / n;
    let sum = 1 / a + 1 / b;
    for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) / (a + i * h);
    const integral = (h / 3) * sum;
    const c = (2 * Math.PI * EPS0 * 3400 * L) / integral;
    expect(tubeCapacitances(fieldTube).tubeCapacitanceF / c).toBeCloseTo(1, 10);
  });

  it('when PZT-5A is picked instead, then εr 1700 halves the capacitance [S: Erturk & Inman 2011, App. E]', () => {
    expect(materials['PZT-5A'].relPermittivity33T).toBe(1700);
    const a = tubeCapacitances({ ...fieldTube, relPermittivity: 1700 }).tubeCapacitanceF;
    expect(a / tubeCapacitances(fieldTube).tubeCapacitanceF).toBeCloseTo(0.5, 12);
  });
});

describe('tube bending mode [S: Rao, Mechanical Vibrations; Timoshenko]', () => {
  it('when the annulus is formed, then A = π(OD²−ID²)/4 and I = π(OD⁴−ID⁴)/64 [calc]', () => {
    const s = annulusSection(OD, ID);
    expect(s.areaM2).toBeCloseTo((Math.PI / 4) * (OD * OD - ID * ID), 15);
    expect(s.secondMomentM4 / ((Math.PI / 64) * (OD ** 4 - ID ** 4))).toBeCloseTo(1, 12);
  });

  it('when I/A = (OD²+ID²)/16 is put into f₁ = (1.8751²/2π)·√(EI/ρAL⁴) by hand, then it agrees [calc]', () => {
    const hand = ((1.8751 ** 2 / (2 * Math.PI)) * Math.sqrt((60.6e9 * (OD ** 2 + ID ** 2)) / (16 * 7500))) / L ** 2;
    expect(tubeBendingModeHz(fieldTube) / hand).toBeCloseTo(1, 4);
  });

  it('when the section is replaced by a rectangle of the same I/A (t = √(12·I/A)), then the bar shortcut gives the same f₁ [calc: independent route]', () => {
    const { areaM2, secondMomentM4 } = annulusSection(OD, ID);
    const bar = rectangularCantileverHz({
      lengthM: L,
      thicknessM: Math.sqrt((12 * secondMomentM4) / areaM2),
      youngsModulusPa: 60.6e9,
      densityKgPerM3: 7500,
    });
    expect(tubeBendingModeHz(fieldTube) / bar).toBeCloseTo(1, 12);
  });

  it('when EI·u⁗ = ρA·ω²·u is shot from the clamp to the free end, then its first root is f₁ [calc: independent route, RK4]', () => {
    const A = (Math.PI / 4) * (OD * OD - ID * ID);
    const I = (Math.PI / 64) * (OD ** 4 - ID ** 4);
    // In s = x/L: u⁗ = q·u with q = ρAω²L⁴/(EI); clamped u = u' = 0, free end needs u'' = u''' = 0.
    const det = (fHz: number) => {
      const q = (7500 * A * (2 * Math.PI * fHz) ** 2 * L ** 4) / (60.6e9 * I);
      const f = (y: number[]) => [y[1], y[2], y[3], q * y[0]];
      const one = rk4(f, [0, 0, 1, 0]);
      const two = rk4(f, [0, 0, 0, 1]);
      return one[2] * two[3] - one[3] * two[2];
    };
    expect(bisect(det, 5e3, 60e3) / tubeBendingModeHz(fieldTube)).toBeCloseTo(1, 6);
  });
});

describe('tube axial mode f = (1/4L)·√(E/ρ) [S: Rao, Mechanical Vibrations — memory for the equation number]', () => {
  it("when FIELD.md's tube is PZT-5H, then f = √(60.6e9/7500)/(4·12.7 mm) [calc]", () => {
    expect(axialModeHz(L, fieldTube)).toBeCloseTo(Math.sqrt(60.6e9 / 7500) / (4 * 12.7e-3), 6);
  });

  it('when E·u″ = −ρω²·u is shot from the clamp (u = 0) to the free end (u′ = 0), then its first root is f [calc: independent route, RK4]', () => {
    const end = (fHz: number) => {
      const q = (7500 * (2 * Math.PI * fHz) ** 2 * L ** 2) / 60.6e9;
      return rk4((y) => [y[1], -q * y[0]], [0, 1])[1];
    };
    expect(bisect(end, 10e3, 100e3) / axialModeHz(L, fieldTube)).toBeCloseTo(1, 8);
  });
});

describe('tube calculator', () => {
  it("when FIELD.md's tube is entered, then the API figures match the functions and the bore is OD − 2·wall [calc]", () => {
    const r = tubeCalculator.compute(tubeInput.parse(fieldTube));
    expect(r.innerDiameterMm).toBeCloseTo(5.334, 12);
    expect(r.quadrantCapacitanceF).toBe(tubeCapacitances(fieldTube).quadrantCapacitanceF);
    expect(r.bendingModeHz).toBe(tubeBendingModeHz(fieldTube));
    expect(r.lengthToDiameter).toBeCloseTo(2, 12);
    expect(r.warnings).toEqual([]);
    expect(r.cautions).toEqual([]);
  });

  it('when the tube is shorter than twice its diameter, then it warns short_tube [practice]', () => {
    const r = tubeCalculator.compute(tubeInput.parse({ ...fieldTube, lengthMm: 9.5 }));
    expect(r.warnings.map((w) => w.code)).toEqual(['short_tube']);
  });

  it('when the wall is half the diameter or more, then it is refused with a RangeError', () => {
    expect(() => tubeCalculator.compute({ ...fieldTube, wallMm: 3.175 })).toThrow(RangeError);
    expect(() => tubeCalculator.compute({ ...fieldTube, wallMm: 4 })).toThrow(/half the outer diameter/);
  });

  it('when a field is zero or unknown, then the schema refuses it', () => {
    expect(tubeInput.safeParse({ ...fieldTube, wallMm: 0 }).success).toBe(false);
    expect(tubeInput.safeParse({ ...fieldTube, material: 'PZT-5H' }).success).toBe(false);
  });
});
