import { PutSettingsInput, type FieldErrors, type WorkshopSettings } from '@keybed/shared';
import { issuesToFields } from '@/lib/form';
import { moneyInputText, parseMoneyInput, parsePercentInput, percentInputText } from '@/lib/money';

/** The settings form as typed: money and percentages as text, the rest as the API has them. */
export interface SettingsDraft {
  currency: string;
  taxRate: string;
  labourRate: string;
  targetMargin: string;
  allowNegativeStock: boolean;
  timeZone: string;
  benchDayClose: string;
  workingDayStart: string;
  workingDayEnd: string;
  workingWeekdays: number[];
}

/** The owner's view of the settings; fields a role cannot see start empty. */
export function draftFrom(s: WorkshopSettings): SettingsDraft {
  return {
    currency: s.currency,
    taxRate: s.taxRateBasisPoints === undefined ? '' : percentInputText(s.taxRateBasisPoints),
    labourRate: s.labourRateMinorPerHour === undefined ? '' : moneyInputText(s.labourRateMinorPerHour, s.currency),
    targetMargin: s.targetMarginBasisPoints === undefined ? '' : percentInputText(s.targetMarginBasisPoints),
    allowNegativeStock: s.allowNegativeStock,
    timeZone: s.timeZone,
    benchDayClose: s.benchDayClose,
    workingDayStart: s.workingDayStart,
    workingDayEnd: s.workingDayEnd,
    workingWeekdays: [...s.workingWeekdays].sort((a, b) => a - b),
  };
}

type Result = { data: PutSettingsInput; fields?: undefined } | { data?: undefined; fields: FieldErrors };

/**
 * Reads the typed settings into the API's input, checked with the same schema the API uses.
 * Every problem is reported at once, each on its field, so nothing typed is lost.
 */
export function settingsInput(draft: SettingsDraft): Result {
  const fields: FieldErrors = {};
  const read = (name: string, parsed: { ok: true; value: number } | { ok: false; message: string }) => {
    if (parsed.ok) return parsed.value;
    fields[name] = [parsed.message];
    return undefined;
  };
  const currencyKnown = /^[A-Z]{3}$/.test(draft.currency);
  const candidate = {
    currency: draft.currency,
    taxRateBasisPoints: read('taxRateBasisPoints', parsePercentInput(draft.taxRate)),
    labourRateMinorPerHour: currencyKnown ? read('labourRateMinorPerHour', parseMoneyInput(draft.labourRate, draft.currency)) : undefined,
    targetMarginBasisPoints: read('targetMarginBasisPoints', parsePercentInput(draft.targetMargin)),
    allowNegativeStock: draft.allowNegativeStock,
    timeZone: draft.timeZone,
    benchDayClose: draft.benchDayClose,
    workingDayStart: draft.workingDayStart,
    workingDayEnd: draft.workingDayEnd,
    workingWeekdays: draft.workingWeekdays,
  };
  // The schema checks the day's order only once every field is valid; say it now as well.
  if (draft.workingDayStart && draft.workingDayEnd && draft.workingDayStart >= draft.workingDayEnd) {
    fields.workingDayEnd = ['The working day must end after it starts'];
  }
  const parsed = PutSettingsInput.safeParse(candidate);
  if (parsed.success && Object.keys(fields).length === 0) return { data: parsed.data };
  const schemaFields = parsed.success ? {} : issuesToFields(parsed.error.issues);
  // A field that could not be read already says why; the schema's "required" would only repeat it.
  return { fields: { ...schemaFields, ...fields } };
}

export const WEEKDAYS: ReadonlyArray<{ value: number; label: string }> = [
  { value: 1, label: 'Monday' },
  { value: 2, label: 'Tuesday' },
  { value: 3, label: 'Wednesday' },
  { value: 4, label: 'Thursday' },
  { value: 5, label: 'Friday' },
  { value: 6, label: 'Saturday' },
  { value: 7, label: 'Sunday' },
];
