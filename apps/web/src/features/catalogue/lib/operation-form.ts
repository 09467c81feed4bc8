import {
  CreateCatalogueOperationInput,
  DEFAULT_SURVEY_TEMPLATES,
  formatHoursMinutes,
  formatQuantityMilli,
  type CatalogueLineInput,
  type CatalogueOperation,
  type FieldErrors,
  type SurveyPianoType,
  type UpdateCatalogueOperationInput,
} from '@keybed/shared';
import { issuesToFields } from '@/lib/form';
import { moneyInputText, parseHoursInput, parseMoneyInput, parseQuantityInput } from '@/lib/money';

/** One default line as edited: hours, quantities and money stay as typed until saved. */
export interface LineDraft {
  kind: 'labour' | 'part' | 'sublet';
  description: string;
  hoursText: string;
  partId: string;
  quantityText: string;
  supplier: string;
  priceText: string;
  costText: string;
}

export interface OperationDraft {
  name: string;
  description: string;
  pianoType: SurveyPianoType | '';
  componentKeys: string[];
  isActive: boolean;
  lines: LineDraft[];
}

export const blankLineDraft = (kind: LineDraft['kind']): LineDraft => ({ kind, description: '', hoursText: '', partId: '', quantityText: '1', supplier: '', priceText: '', costText: '' });

export const EMPTY_OPERATION: OperationDraft = { name: '', description: '', pianoType: '', componentKeys: [], isActive: true, lines: [blankLineDraft('labour')] };

/** The components a catalogue operation may remedy: the default templates' keys, grand's names first. */
export const COMPONENT_CHOICES: ReadonlyArray<{ key: string; name: string }> = (() => {
  const seen = new Map<string, string>();
  for (const item of [...DEFAULT_SURVEY_TEMPLATES.grand, ...DEFAULT_SURVEY_TEMPLATES.upright]) if (!seen.has(item.key)) seen.set(item.key, item.name);
  return [...seen].map(([key, name]) => ({ key, name }));
})();

export function draftOf(op: CatalogueOperation, currency: string): OperationDraft {
  return {
    name: op.name,
    description: op.description,
    pianoType: op.pianoType ?? '',
    componentKeys: [...op.componentKeys],
    isActive: op.isActive,
    lines: op.lines.map((l) => ({
      kind: l.kind,
      description: l.description,
      hoursText: l.minutes === null ? '' : formatHoursMinutes(l.minutes),
      partId: l.part?.id ?? '',
      quantityText: l.quantityMilli === null ? '1' : formatQuantityMilli(l.quantityMilli),
      supplier: l.supplier ?? '',
      priceText: l.kind === 'sublet' && l.unitPriceMinor != null ? moneyInputText(l.unitPriceMinor, currency) : '',
      costText: l.kind === 'sublet' && l.unitCostMinor != null ? moneyInputText(l.unitCostMinor, currency) : '',
    })),
  };
}

function lineInput(line: LineDraft, n: number, currency: string, fields: FieldErrors): CatalogueLineInput | null {
  const fail = (name: string, message: string) => void (fields[`lines.${n}.${name}`] = [message]);
  if (line.kind === 'labour') {
    const minutes = parseHoursInput(line.hoursText);
    if (!minutes.ok) fail('minutes', minutes.message);
    return minutes.ok ? { kind: 'labour', description: line.description, minutes: minutes.value } : null;
  }
  const quantity = parseQuantityInput(line.quantityText);
  if (!quantity.ok) fail('quantityMilli', quantity.message);
  if (line.kind === 'part') {
    if (!line.partId) fail('partId', 'Choose a part');
    return quantity.ok && line.partId ? { kind: 'part', partId: line.partId, quantityMilli: quantity.value, ...(line.description.trim() ? { description: line.description } : {}) } : null;
  }
  const price = parseMoneyInput(line.priceText, currency);
  if (!price.ok) fail('unitPriceMinor', price.message);
  const cost = line.costText.trim() === '' ? null : parseMoneyInput(line.costText, currency);
  if (cost && !cost.ok) fail('unitCostMinor', cost.message);
  if (!quantity.ok || !price.ok || (cost && !cost.ok)) return null;
  return { kind: 'sublet', description: line.description, supplier: line.supplier, quantityMilli: quantity.value, unitPriceMinor: price.value, ...(cost?.ok ? { unitCostMinor: cost.value } : {}) };
}

/** Stands in for a line whose numbers could not be read, so the schema still checks its words at the right index. */
function placeholderOf(line: LineDraft): CatalogueLineInput {
  if (line.kind === 'labour') return { kind: 'labour', description: line.description, minutes: 1 };
  if (line.kind === 'part') return { kind: 'part', partId: '00000000-0000-4000-8000-000000000000', quantityMilli: 1 };
  return { kind: 'sublet', description: line.description, supplier: line.supplier, quantityMilli: 1, unitPriceMinor: 0 };
}

type ToInput = { ok: true; input: CreateCatalogueOperationInput } | { ok: false; fields: FieldErrors };

/** The draft as `POST /api/catalogue` takes it, checked with the API's schema; problems keyed by field. */
export function toOperationInput(draft: OperationDraft, currency: string): ToInput {
  const fields: FieldErrors = {};
  const lines = draft.lines.map((line, n) => lineInput(line, n, currency, fields));
  const parsed = CreateCatalogueOperationInput.safeParse({
    name: draft.name,
    description: draft.description,
    pianoType: draft.pianoType || null,
    componentKeys: draft.componentKeys,
    isActive: draft.isActive,
    lines: lines.map((l, n) => l ?? placeholderOf(draft.lines[n]!)),
  });
  if (!parsed.success) for (const [key, messages] of Object.entries(issuesToFields(parsed.error.issues))) fields[key] ??= messages;
  if (!parsed.success || Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, input: parsed.data };
}

/**
 * The changes for `PATCH /api/catalogue/:id`. Lines go only when they were edited, so a member who
 * cannot see a sublet's cost never sends the lines back without it.
 */
export function toOperationChanges(draft: OperationDraft, initial: OperationDraft, version: number, currency: string): { ok: true; changes: UpdateCatalogueOperationInput } | { ok: false; fields: FieldErrors } {
  const result = toOperationInput(draft, currency);
  if (!result.ok) return result;
  const { lines, ...rest } = result.input;
  const isLinesEdited = JSON.stringify(draft.lines) !== JSON.stringify(initial.lines);
  return { ok: true, changes: { version, ...rest, ...(isLinesEdited ? { lines } : {}) } };
}
