import { describe, expect, test } from 'vitest';
import { axisColor, chartBackgrounds, chartColors } from '../../../src/components/charts/chart-theme.ts';
import { logTicks, niceTicks } from '../../../src/components/charts/chart-axes.ts';

/** Relative luminance of an sRGB colour [S: WCAG 2.1, W3C Recommendation 2018, definition "relative luminance"]. */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const lin = (c: number) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  return 0.2126 * lin(r!) + 0.7152 * lin(g!) + 0.0722 * lin(b!);
}

/** (L1 + 0.05) / (L2 + 0.05), lighter over darker [S: WCAG 2.1, definition "contrast ratio"]. */
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

describe('chart theme', () => {
  test('the contrast formula gives 21:1 for black on white and 1:1 for a colour on itself [S: WCAG 2.1]', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 6);
    expect(contrast(chartColors.teal, chartColors.teal)).toBe(1);
  });

  test('axis text reaches 4.5:1 on the card and on the page background [S: WCAG 2.1 SC 1.4.3]', () => {
    expect(contrast(axisColor, chartBackgrounds.card)).toBeGreaterThanOrEqual(4.5);
    expect(contrast(axisColor, chartBackgrounds.paper)).toBeGreaterThanOrEqual(4.5);
  });

  test('the grid rule colour is too faint for text, so axis text does not use it [calc]', () => {
    expect(contrast(chartColors.rule, chartBackgrounds.card)).toBeLessThan(4.5);
    expect(axisColor).not.toBe(chartColors.rule);
  });
});

describe('chart ticks', () => {
  test('1-2-5 steps inside the range [practice]', () => {
    expect(niceTicks(0, 10)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(niceTicks(-0.37, 0.41)).toEqual([-0.2, 0, 0.2, 0.4]);
    expect(niceTicks(3, 3)).toEqual([3]);
  });

  test('decades on a wide log axis, 1-2-5 within a narrow one [practice]', () => {
    expect(logTicks(0.05, 2000)).toEqual([0.1, 1, 10, 100, 1000]);
    expect(logTicks(3, 60)).toEqual([5, 10, 20, 50]);
  });
});
