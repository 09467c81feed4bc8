import { CreatePartInput, UpdatePartInput, formatQuantityMilli, parseQuantityMilli, type FieldErrors, type Part } from '@keybed/shared';
import { issuesToFields, type FormSchema } from '@/lib/form';
import { moneyInputText, parseMoneyInput, parsePercentInput, percentInputText, type Parsed } from '@/lib/money';

/** How a part's sell price is set: a fixed price, or the cost plus a markup. */
export type Pricing = 'fixed' | 'markup';

/** The part form as typed. */
export interface PartDraft {
  sku: string;
  name: string;
  unit: string;
  supplier: string;
  unitCost: string;
  pricing: Pricing;
  sellPrice: string;
  markup: string;
  reorderLevel: string;
  isActive: boolean;
}

export const EMPTY_PART: PartDraft = { sku: '', name: '', unit: '', supplier: '', unitCost: '', pricing: 'fixed', sellPrice: '', markup: '', reorderLevel: '0', isActive: true };

/** The owner's form for an existing part. */
export function draftFromPart(part: Part, currency: string): PartDraft {
  const hasMarkup = part.markupBasisPoints !== null && part.markupBasisPoints !== undefined;
  return {
    sku: part.sku,
    name: part.name,
    unit: part.unit,
    supplier: part.supplier,
    unitCost: part.unitCostMinor === undefined ? '' : moneyInputText(part.unitCostMinor, currency),
    pricing: hasMarkup ? 'markup' : 'fixed',
    sellPrice: part.sellPriceMinor === undefined || hasMarkup ? '' : moneyInputText(part.sellPriceMinor, currency),
    markup: hasMarkup ? percentInputText(part.markupBasisPoints!) : '',
    reorderLevel: formatQuantityMilli(part.reorderLevelMilli),
    isActive: part.isActive,
  };
}

const reorderLevel = (text: string): Parsed<number> => {
  const milli = parseQuantityMilli(text.trim() === '' ? '0' : text.trim().replace(',', '.'));
  return milli === null || milli < 0 ? { ok: false, message: 'Write a quantity like 2 or 0.5, or 0 for none' } : { ok: true, value: milli };
};

type Result<T> = { data: T; fields?: undefined } | { data?: undefined; fields: FieldErrors };

/** The typed part as the API's fields, with every problem on its own field. */
function partFields(draft: PartDraft, currency: string) {
  const fields: FieldErrors = {};
  const read = (name: string, parsed: Parsed<number>) => (parsed.ok ? parsed.value : ((fields[name] = [parsed.message]), undefined));
  const values = {
    sku: draft.sku,
    name: draft.name,
    unit: draft.unit,
    supplier: draft.supplier,
    unitCostMinor: read('unitCostMinor', parseMoneyInput(draft.unitCost, currency)),
    sellPriceMinor: draft.pricing === 'fixed' ? read('sellPriceMinor', parseMoneyInput(draft.sellPrice, currency)) : null,
    markupBasisPoints: draft.pricing === 'markup' ? read('markupBasisPoints', parsePercentInput(draft.markup)) : null,
    reorderLevelMilli: read('reorderLevelMilli', reorderLevel(draft.reorderLevel)),
    isActive: draft.isActive,
  };
  return { values, fields };
}

function check<T>(schema: FormSchema<T>, values: unknown, fields: FieldErrors): Result<T> {
  const parsed = schema.safeParse(values);
  if (parsed.success && Object.keys(fields).length === 0) return { data: parsed.data };
  return { fields: { ...(parsed.success ? {} : issuesToFields(parsed.error.issues)), ...fields } };
}

/** A new part for `POST /api/parts`. */
export function createPartInput(draft: PartDraft, currency: string): Result<CreatePartInput> {
  const { values, fields } = partFields(draft, currency);
  return check(CreatePartInput, values, fields);
}

/** Every field of an existing part for `PATCH /api/parts/:id`; the pricing not chosen is cleared. */
export function updatePartInput(draft: PartDraft, currency: string): Result<UpdatePartInput> {
  const { values, fields } = partFields(draft, currency);
  return check(UpdatePartInput, values, fields);
}

/** "2.5 m", "1 set". */
export function quantityWithUnit(milli: number, unit: string): string {
  return `${formatQuantityMilli(milli)} ${unit}`;
}

export const MOVEMENT_LABELS = { received: 'Received', used: 'Used', returned: 'Returned', adjusted: 'Adjusted' } as const;
