import { describe, expect, it } from 'vitest';
import type { Part } from '@keybed/shared';
import { createPartInput, draftFromPart, EMPTY_PART, quantityWithUnit, updatePartInput } from './part-form';

const cloth: Part = {
  id: 'p3',
  sku: 'KBC-1',
  name: 'Key bushing cloth',
  unit: 'm',
  supplier: 'Larkspur Felts',
  reorderLevelMilli: 5000,
  isActive: true,
  onHandMilli: 7500,
  isLowStock: false,
  sellPriceMinor: 2400,
  unitCostMinor: 1800,
  markupBasisPoints: null,
  averageUnitCostMinor: 1850,
  stockValueMinor: 13875,
  createdAt: '2026-09-02T00:00:00Z',
  updatedAt: '2026-09-02T00:00:00Z',
};

describe('part form', () => {
  it('when the owner adds a part at a fixed price, then money is read exactly into minor units', () => {
    const draft = { ...EMPTY_PART, sku: 'SF-1', name: 'Shellac flakes', unit: 'kg', supplier: 'Larkspur Felts', unitCost: '38.00', sellPrice: '48', reorderLevel: '1' };
    expect(createPartInput(draft, 'GBP').data).toMatchObject({ unitCostMinor: 3800, sellPriceMinor: 4800, markupBasisPoints: null, reorderLevelMilli: 1000 });
  });

  it('when the price follows the cost by a markup, then the fixed price is cleared', () => {
    const draft = { ...draftFromPart(cloth, 'GBP'), pricing: 'markup' as const, markup: '33.33' };
    expect(updatePartInput(draft, 'GBP').data).toMatchObject({ sellPriceMinor: null, markupBasisPoints: 3333 });
  });

  it('when fields are missing or wrong, then each one says so', () => {
    const result = createPartInput({ ...EMPTY_PART, sku: 'bad sku!', unitCost: 'x', sellPrice: '', reorderLevel: '-1' }, 'GBP');
    expect(Object.keys(result.fields ?? {}).sort()).toEqual(['name', 'reorderLevelMilli', 'sellPriceMinor', 'sku', 'unit', 'unitCostMinor']);
  });

  it('when an existing part is opened, then its figures read back as typed text', () => {
    expect(draftFromPart(cloth, 'GBP')).toMatchObject({ unitCost: '18.00', sellPrice: '24.00', pricing: 'fixed', reorderLevel: '5' });
    expect(quantityWithUnit(2500, 'm')).toBe('2.5 m');
  });
});
