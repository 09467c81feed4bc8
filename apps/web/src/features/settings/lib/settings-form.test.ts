import { describe, expect, it } from 'vitest';
import type { WorkshopSettings } from '@keybed/shared';
import { draftFrom, settingsInput } from './settings-form';

const fennick: WorkshopSettings = {
  currency: 'GBP',
  allowNegativeStock: false,
  timeZone: 'Europe/London',
  benchDayClose: '19:00',
  workingDayStart: '08:00',
  workingDayEnd: '17:30',
  workingWeekdays: [5, 1, 2, 3, 4],
  taxRateBasisPoints: 2000,
  labourRateMinorPerHour: 5500,
  targetMarginBasisPoints: 2500,
};

describe('settings form', () => {
  it('when the owner opens the settings, then money reads as text and saving unchanged gives the same values', () => {
    const draft = draftFrom(fennick);
    expect(draft).toMatchObject({ taxRate: '20', labourRate: '55.00', targetMargin: '25', workingWeekdays: [1, 2, 3, 4, 5] });
    expect(settingsInput(draft).data).toEqual({ ...fennick, workingWeekdays: [1, 2, 3, 4, 5] });
  });

  it('when several fields are wrong, then each says why on its own field', () => {
    const result = settingsInput({ ...draftFrom(fennick), taxRate: 'lots', labourRate: '55.555', workingDayEnd: '07:00', workingWeekdays: [] });
    expect(Object.keys(result.fields ?? {}).sort()).toEqual(['labourRateMinorPerHour', 'taxRateBasisPoints', 'workingDayEnd', 'workingWeekdays']);
  });

  it('when the target margin is 100 %, then it is refused', () => {
    expect(settingsInput({ ...draftFrom(fennick), targetMargin: '100' }).fields?.targetMarginBasisPoints).toBeDefined();
  });
});
