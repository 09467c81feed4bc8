import { describe, expect, it } from 'vitest';
import {
  margin,
  marginFromMarkup,
  markup,
  markupFromMargin,
  priceFromCostAndMargin,
  priceFromCostAndMarkup,
  profitMinor,
} from './margin';

describe('markup and margin', () => {
  it.each([
    // Cost £100, price £125 → markup 25 %, margin 20 %: TRADE.md §8 [S17].
    { cost: 10000, price: 12500, markup: 0.25, margin: 0.2, source: '[S17]' },
    // Scenario: grand hammer set, cost £520, sell £690 (derived).
    { cost: 52000, price: 69000, markup: 0.326923, margin: 0.246377, source: 'derived' },
    { cost: 10000, price: 10000, markup: 0, margin: 0, source: 'derived' },
    { cost: 10000, price: 8000, markup: -0.2, margin: -0.25, source: 'derived' }, // sold below cost
    { cost: 0, price: 5000, markup: null, margin: 1, source: 'defined: no cost, no markup' },
    { cost: 10000, price: 0, markup: -1, margin: null, source: 'defined: no price, no margin' },
    { cost: 10000, price: -2000, markup: -1.2, margin: null, source: 'defined: a credit has no margin' },
    { cost: -500, price: 1000, markup: null, margin: 1.5, source: 'defined: negative cost, no markup' },
  ])('when cost $cost and price $price, then markup $markup and margin $margin ($source)', (row) => {
    const m = markup(row.cost, row.price);
    const g = margin(row.cost, row.price);
    if (row.markup === null) expect(m).toBeNull();
    else expect(m).toBeCloseTo(row.markup, 6);
    if (row.margin === null) expect(g).toBeNull();
    else expect(g).toBeCloseTo(row.margin, 6);
  });

  it('when profit is asked, then it is price − cost in minor units', () => {
    expect(profitMinor(10000, 12500)).toBe(2500);
  });
});

describe('converting between markup and margin', () => {
  it.each([
    { markup: 0.25, margin: 0.2 }, // [S17]: margin = m / (1 + m)
    { markup: 1, margin: 0.5 },
    { markup: 0, margin: 0 },
    { markup: -0.2, margin: -0.25 },
  ])('when markup $markup, then margin $margin and back [S17]', ({ markup: m, margin: g }) => {
    expect(marginFromMarkup(m)).toBeCloseTo(g, 12);
    expect(markupFromMargin(g)).toBeCloseTo(m, 12);
  });

  it.each([{ markup: -1 }, { markup: -1.5 }])('when markup $markup, then margin is null', ({ markup: m }) => {
    expect(marginFromMarkup(m)).toBeNull();
  });

  it.each([{ margin: 1 }, { margin: 1.2 }])('when margin $margin, then markup is null', ({ margin: g }) => {
    expect(markupFromMargin(g)).toBeNull();
  });
});

describe('pricing from cost', () => {
  it.each([
    { cost: 10000, bp: 2500, price: 12500 }, // [S17]
    { cost: 52000, bp: 3269, price: 68999 }, // 68 998.8p → 68 999p
    { cost: 1450, bp: 3333, price: 1933 }, // 1933.285p → 1933p
    { cost: 1, bp: 5000, price: 2 }, // 1.5p → 2p
    { cost: 10000, bp: -10000, price: 0 },
  ])('when cost $cost and markup $bp bp, then price $price', ({ cost, bp, price }) => {
    expect(priceFromCostAndMarkup(cost, bp)).toBe(price);
  });

  it.each([
    { cost: 10000, bp: 2000, price: 12500 }, // [S17]
    { cost: 52000, bp: 2500, price: 69333 }, // 69 333.3p
    { cost: 1, bp: 3333, price: 1 }, // 1.49992p
    { cost: 10000, bp: -2500, price: 8000 }, // selling at a loss on purpose
    { cost: 0, bp: 5000, price: 0 },
  ])('when cost $cost and margin $bp bp, then price $price', ({ cost, bp, price }) => {
    expect(priceFromCostAndMargin(cost, bp)).toBe(price);
  });

  it('when the margin is 100 % or more, or markup below −100 %, then RangeError', () => {
    expect(() => priceFromCostAndMargin(10000, 10000)).toThrow(RangeError);
    expect(() => priceFromCostAndMarkup(10000, -10001)).toThrow(RangeError);
  });
});
