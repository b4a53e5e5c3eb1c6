import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  convertDisplacement,
  displacementUnitLabels,
  displacementUnits,
  fromNm,
  fromVolts,
  nmPerDisplacementUnit,
  toNm,
  toVolts,
  voltageUnits,
} from '@shared/units.ts';

describe('units', () => {
  it('when converting one of each unit, then the factors are exact [S: NBS Circular 572 addendum, 1960; µin and mil [calc]]', () => {
    expect(toNm(1, 'nm')).toBe(1);
    expect(toNm(1, 'um')).toBe(1000);
    expect(toNm(1, 'angstrom')).toBe(0.1);
    expect(toNm(1, 'uin')).toBe(25.4);
    expect(toNm(1, 'mil')).toBe(25400);
    expect(toNm(10, 'angstrom')).toBe(1);
    expect(toNm(1000, 'uin')).toBe(25400); // 1000 µin = 1 mil
    expect(nmPerDisplacementUnit).toEqual({ nm: 1, um: 1000, angstrom: 0.1, uin: 25.4, mil: 25400 });
  });

  it('when converting 1 mil to µm and 1 µm to Å, then 25.4 and 10 000 [calc]', () => {
    expect(convertDisplacement(1, 'mil', 'um')).toBe(25.4);
    expect(convertDisplacement(1, 'um', 'angstrom')).toBe(10000);
    expect(convertDisplacement(3, 'nm', 'nm')).toBe(3);
  });

  it('when converting volts, then mV divides by 1000', () => {
    expect(toVolts(1500, 'mV')).toBe(1.5);
    expect(toVolts(1.5, 'V')).toBe(1.5);
    expect(fromVolts(1.5, 'mV')).toBe(1500);
  });

  it('when listing units, then the pickers get every unit with a human label', () => {
    expect(displacementUnits).toEqual(['nm', 'um', 'angstrom', 'uin', 'mil']);
    expect(voltageUnits).toEqual(['V', 'mV']);
    expect(displacementUnitLabels).toEqual({ nm: 'nm', um: 'µm', angstrom: 'Å', uin: 'µin', mil: 'mil' });
  });

  it('when a value goes to nm and back, then it returns within a few ulps [calc]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((v) => v === 0 || Math.abs(v) > 1e-290),
        fc.constantFrom(...displacementUnits),
        fc.constantFrom(...displacementUnits),
        (value, from, to) => {
          const tolerance = 4 * Number.EPSILON * Math.abs(value);
          expect(Math.abs(fromNm(toNm(value, from), from) - value)).toBeLessThanOrEqual(tolerance);
          expect(Math.abs(convertDisplacement(convertDisplacement(value, from, to), to, from) - value)).toBeLessThanOrEqual(tolerance);
          expect(fromVolts(toVolts(value, 'mV'), 'mV')).toBeCloseTo(value, 0);
        },
      ),
    );
  });
});
