import { describe, expect, test } from 'vitest';
import { listBuildsQuery } from '../../shared/schemas/build.ts';
import { listListingsQuery } from '../../shared/schemas/listing.ts';
import { listPartsQuery } from '../../shared/schemas/part.ts';
import { readSearch, writeSearch } from '../../src/lib/url-search.ts';

describe('URL search state read with the shared query schemas', () => {
  test('when a registry link has good and odd values, then the good ones are kept and the odd ones fall back to defaults', () => {
    const read = readSearch(listPartsQuery, new URLSearchParams('gainMin=80&gainMax=150&category=crystal&sort=-gain&page=abc&minRuns=3'), [
      'pageSize',
      'format',
    ]);
    expect(read).toEqual({ gainMin: 80, gainMax: 150, sort: '-gain', page: 1, minRuns: 3 });
  });

  test('when the exchange link asks for free offers in a region, then freeOnly is a boolean and the region kept', () => {
    const read = readSearch(listListingsQuery, new URLSearchParams('freeOnly=true&region=Lyon&kind=offering&page=2'), [
      'pageSize',
      'partId',
    ]);
    expect(read).toMatchObject({ freeOnly: true, region: 'Lyon', kind: 'offering', page: 2 });
  });

  test('when the builds index gets an unknown kind, then it is left out', () => {
    expect(readSearch(listBuildsQuery, new URLSearchParams('kind=telescope&q=afm'), ['pageSize'])).toEqual({ q: 'afm', page: 1 });
  });

  test('when a search is written, then defaults and empty values are left out', () => {
    expect(writeSearch({ q: 'afm', kind: undefined, page: 1, freeOnly: false }, { page: 1 })).toBe('?q=afm');
    expect(writeSearch({ page: 3 }, { page: 1 })).toBe('?page=3');
    expect(writeSearch({}, {})).toBe('');
  });
});
