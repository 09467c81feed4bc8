import { describe, expect, it } from 'vitest';
import { hoursUse, marginsFiltersFrom, withMarginsFilters } from './margins-filters';

describe('marginsFiltersFrom', () => {
  it('when the URL carries a period and a status, then they are the filters', () => {
    expect(marginsFiltersFrom(new URLSearchParams('from=2026-01-01&to=2026-06-30&status=active'))).toEqual({
      filters: { from: '2026-01-01', to: '2026-06-30', status: 'active' },
      problems: {},
    });
  });

  it('when the URL has a bad date, a bad status or an end before the start, then each is left out and said why', () => {
    const { filters, problems } = marginsFiltersFrom(new URLSearchParams('from=2026-07-01&to=2026-06-30&status=sleeping'));
    expect(filters).toEqual({ from: '2026-07-01' });
    expect(Object.keys(problems).sort()).toEqual(['status', 'to']);
    expect(marginsFiltersFrom(new URLSearchParams('from=31/12/2026')).problems.from).toBeDefined();
  });

  it('when a filter is cleared, then it leaves the URL', () => {
    expect(withMarginsFilters(new URLSearchParams('from=2026-01-01&status=done'), { status: '' }).toString()).toBe('from=2026-01-01');
  });
});

describe('hoursUse', () => {
  it('when hours run over the estimate, then the share is above one and flagged', () => {
    expect(hoursUse(240, 1335)).toEqual({ ratio: 1335 / 240, isOver: true });
    expect(hoursUse(1920, 480)).toEqual({ ratio: 0.25, isOver: false });
    expect(hoursUse(0, 0)).toEqual({ ratio: 0, isOver: false });
    expect(hoursUse(0, 30)).toEqual({ ratio: 1, isOver: true });
  });
});
