import { describe, expect, it } from 'vitest';
import { formatPlusMinus, formatShort, formatWithUncertainty } from '@shared/format/measured-number.ts';

describe('formatWithUncertainty [S: GUM, JCGM 100:2008, 7.2.6: the uncertainty to two significant figures, the value to the same place]', () => {
  it.each([
    [102.6123, 1.2934, '102.6', '1.3'],
    [23.4, 12.3, '23', '12'],
    [100, 0.00123, '100.0000', '0.0012'],
    [12345, 678, '12\u202F350', '680'],
    [-0.5, 0.05, '\u22120.500', '0.050'],
    [10.0123, 0.0999, '10.01', '0.10'],
  ])('when %d ± %d, then %s ± %s', (v, u, value, uncertainty) => {
    expect(formatWithUncertainty(v, u)).toEqual({ value, uncertainty });
  });

  it('when the uncertainty is missing or zero, then the value alone to 4 figures', () => {
    expect(formatWithUncertainty(102.61, null)).toEqual({ value: '102.6', uncertainty: null });
    expect(formatWithUncertainty(102.61, 0)).toEqual({ value: '102.6', uncertainty: null });
  });
});

describe('formatPlusMinus', () => {
  it('when a 95 % interval and a standard uncertainty are printed, then they never look alike', () => {
    expect(formatPlusMinus(102.74, 0.41, 'ci95')).toBe('102.74 ± 0.41 nm/V (95 %)');
    expect(formatPlusMinus(102.74, 0.41, 'std')).toBe('102.74 ± 0.41 nm/V (u, k = 1)');
  });
});

describe('formatShort', () => {
  it.each([
    [104, '104'],
    [23.46, '23.5'],
    [0.012345, '0.0123'],
    [-5.8, '\u22125.8'],
  ])('when %d, then %s', (v, s) => {
    expect(formatShort(v)).toBe(s);
  });
});
