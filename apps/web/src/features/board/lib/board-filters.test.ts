import { describe, expect, it } from 'vitest';
import { filtersFromSearch, withFilters } from './board-filters';

describe('filtersFromSearch', () => {
  it('when the URL carries every filter, then each is read', () => {
    const id = '0b6f2a8e-3c1d-4e5f-9a7b-2c3d4e5f6a7b';
    expect(filtersFromSearch(new URLSearchParams(`q=Pembleton&blocked=true&technicianId=${id}`))).toEqual({ q: 'Pembleton', blocked: true, technicianId: id });
  });

  it('when a filter is unreadable, then it is left out', () => {
    expect(filtersFromSearch(new URLSearchParams('q=%20&blocked=yes&technicianId=priya'))).toEqual({});
  });
});

describe('withFilters', () => {
  it('when a filter is emptied, then it leaves the URL and the others stay', () => {
    const next = withFilters(new URLSearchParams('q=Feld&blocked=true'), { blocked: false });
    expect(next.toString()).toBe('q=Feld');
  });
});
