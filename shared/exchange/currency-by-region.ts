// The currency a maker most likely prices in, from a region: a CLDR/BCP 47 region code (what the browser's locale
// names, e.g. "en-GB" → GB) or a country named at the end of the listing's region text ("Leeds, UK").
// Codes are ISO 4217 [S: ISO 4217:2015, list one, current currencies and funds]; the region → currency pairs are
// the countries' legal tender (from memory, checked against the same list); the euro area as of 2026 (21 members,
// Bulgaria from 1 January 2026).

const EURO_AREA = [
  'AT',
  'BE',
  'BG',
  'HR',
  'CY',
  'EE',
  'FI',
  'FR',
  'DE',
  'GR',
  'IE',
  'IT',
  'LV',
  'LT',
  'LU',
  'MT',
  'NL',
  'PT',
  'SK',
  'SI',
  'ES',
];

const BY_REGION: Record<string, string> = {
  ...Object.fromEntries(EURO_AREA.map((r) => [r, 'EUR'])),
  GB: 'GBP',
  US: 'USD',
  CA: 'CAD',
  AU: 'AUD',
  NZ: 'NZD',
  CH: 'CHF',
  SE: 'SEK',
  NO: 'NOK',
  DK: 'DKK',
  IS: 'ISK',
  PL: 'PLN',
  CZ: 'CZK',
  HU: 'HUF',
  RO: 'RON',
  UA: 'UAH',
  TR: 'TRY',
  JP: 'JPY',
  KR: 'KRW',
  CN: 'CNY',
  HK: 'HKD',
  TW: 'TWD',
  SG: 'SGD',
  IN: 'INR',
  BR: 'BRL',
  MX: 'MXN',
  AR: 'ARS',
  ZA: 'ZAR',
  KE: 'KES',
  NG: 'NGN',
  IL: 'ILS',
};

/** Country names and common short forms people type at the end of a region, mapped to their region codes. */
const NAMES: Record<string, string> = {
  uk: 'GB',
  'united kingdom': 'GB',
  england: 'GB',
  scotland: 'GB',
  wales: 'GB',
  usa: 'US',
  us: 'US',
  'united states': 'US',
  germany: 'DE',
  deutschland: 'DE',
  france: 'FR',
  netherlands: 'NL',
  belgium: 'BE',
  austria: 'AT',
  ireland: 'IE',
  italy: 'IT',
  spain: 'ES',
  portugal: 'PT',
  finland: 'FI',
  switzerland: 'CH',
  sweden: 'SE',
  norway: 'NO',
  denmark: 'DK',
  poland: 'PL',
  czechia: 'CZ',
  canada: 'CA',
  australia: 'AU',
  'new zealand': 'NZ',
  japan: 'JP',
  india: 'IN',
  brazil: 'BR',
  kenya: 'KE',
  'south africa': 'ZA',
};

/** The currency of a region code ("GB") or of a locale tag whose region is given ("en-GB"); null when unknown. */
export function currencyOfLocale(tag: string): string | null {
  const region = /(?:^|[-_])([A-Za-z]{2})$/.exec(tag.trim())?.[1]?.toUpperCase();
  return (region && BY_REGION[region]) ?? null;
}

/** The currency of the country named last in a region text ("Leeds, UK" → GBP, "Graz, AT" → EUR); null when unknown. */
export function currencyOfRegionText(region: string): string | null {
  const last = region.split(/[,/·]/).pop()?.trim().toLowerCase() ?? '';
  if (!last) return null;
  const code = NAMES[last] ?? (last.length === 2 ? last.toUpperCase() : null);
  return (code && BY_REGION[code]) ?? null;
}

/** What a new price starts in: the listing's region if it names a country, else the browser's locales, else EUR. */
export function defaultCurrency(region: string, locales: readonly string[]): string {
  return currencyOfRegionText(region) ?? locales.map(currencyOfLocale).find((c) => c !== null) ?? 'EUR';
}
