import { describe, expect, test } from 'vitest';
import { parsePointsCsv } from '../../src/features/builds/components/editor/parse-points-csv.ts';
import { parseNumber } from '../../src/lib/csv/number-text.ts';
import { checkFitRows, rowsFromCsv } from '../../src/lib/csv/points-csv.ts';

describe('the one points reader', () => {
  test('when numbers use a decimal comma or a true minus sign, then they read as numbers', () => {
    expect(parseNumber('1,5')).toBe(1.5);
    expect(parseNumber('\u22122')).toBe(-2);
    expect(parseNumber('3e-2')).toBe(0.03);
    expect(parseNumber('abc')).toBeNaN();
  });

  const csv = 'Drive (V);Deflection [µm];Direction\n0;0,01;rising\n5;0,52;+\n10;1,03;u\n5;0,55;falling\n0;0,02;-\n4;x;up\n';

  test('when a semicolon file with decimal commas and sweep aliases is pasted, then the workbench and the run form read the same points', () => {
    const { rows, hadHeader } = rowsFromCsv(csv);
    expect(hadHeader).toBe(true);
    const checked = checkFitRows(rows);
    expect(checked.points.map((p) => [p.volts, p.displacement, p.sweep])).toEqual([
      [0, 0.01, 'up'],
      [5, 0.52, 'up'],
      [10, 1.03, 'up'],
      [5, 0.55, 'down'],
      [0, 0.02, 'down'],
    ]);
    expect(checked.problems.map((p) => p.line)).toEqual([7]);

    const form = parsePointsCsv(csv);
    expect(form.points.map((p) => [p.volts, p.displacement, p.sweep])).toEqual([
      ['0', '0,01', 'up'],
      ['5', '0,52', 'up'],
      ['10', '1,03', 'up'],
      ['5', '0,55', 'down'],
      ['0', '0,02', 'down'],
    ]);
    expect(form.bad).toEqual([{ row: 7, reason: expect.stringMatching(/displacement/) }]);
  });
});
