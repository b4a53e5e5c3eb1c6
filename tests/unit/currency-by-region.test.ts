import { describe, expect, test } from 'vitest';
import { currencyOfLocale, currencyOfRegionText, defaultCurrency } from '../../shared/exchange/currency-by-region.ts';

// Pairs from ISO 4217 (list one) [S: ISO 4217:2015]; the euro area as of 1 January 2026 (Bulgaria joined) [memory].
describe('the currency a new price starts in', () => {
  test('when the browser locale names a region, then its legal tender', () => {
    expect(currencyOfLocale('en-GB')).toBe('GBP');
    expect(currencyOfLocale('de-AT')).toBe('EUR');
    expect(currencyOfLocale('sv_SE')).toBe('SEK');
    expect(currencyOfLocale('bg-BG')).toBe('EUR');
    expect(currencyOfLocale('en')).toBeNull();
    expect(currencyOfLocale('xx-QQ')).toBeNull();
  });
  test('when the region text ends in a country, then that country wins over the locale', () => {
    expect(currencyOfRegionText('Leeds, UK')).toBe('GBP');
    expect(currencyOfRegionText('Graz, AT')).toBe('EUR');
    expect(currencyOfRegionText('Nairobi, Kenya')).toBe('KES');
    expect(currencyOfRegionText('somewhere')).toBeNull();
    expect(defaultCurrency('Leeds, UK', ['de-DE'])).toBe('GBP');
    expect(defaultCurrency('', ['en', 'en-US'])).toBe('USD');
    expect(defaultCurrency('', [])).toBe('EUR');
  });
});
