import {
  formatHoursMinutes,
  formatQuantityMilli,
  type CatalogueLine,
  type CatalogueOperation,
  type CreateSurveyEstimateInput,
  type EstimateLineInput,
  type EstimateOptionInput,
  type EstimateProposal,
  type FieldErrors,
  type SurveyChoice,
} from '@keybed/shared';
import { moneyInputText, parseHoursInput, parseMoneyInput, parseQuantityInput } from '@/lib/money';

/** A line of a ticked operation as the assessor edits it; numbers stay as typed until sent. */
export interface DraftLine {
  kind: 'labour' | 'part' | 'sublet' | 'other';
  description: string;
  hoursText: string;
  quantityText: string;
  priceText: string;
  partId: string | null;
  /** The part's unit ("set", "m"), shown beside its quantity. */
  unit: string;
  /** Owner only, sublet: the supplier's expected cost, carried over untouched. */
  unitCostMinor: number | null;
}

/** One piece of work in the proposal: a catalogue operation, or work the assessor added. */
export interface DraftItem {
  id: string;
  operationId: string | null;
  name: string;
  componentIds: string[];
  isTicked: boolean;
  /** The option the work belongs to; '' when it is always included. */
  optionKey: string;
  /** The lines as edited; null keeps the catalogue's lines as they are. */
  lines: DraftLine[] | null;
}

/** The summary's choices as estimate options: one per alternative, keyed by position. */
export function optionsFromChoices(choices: readonly SurveyChoice[]): EstimateOptionInput[] {
  return choices.flatMap((c, i) => c.alternatives.map((name, j) => ({ key: `choice${i + 1}-${j + 1}`, choice: c.choice, name })));
}

const STOP_WORDS = new Set(['with', 'from', 'into', 'and', 'the', 'for', 'full', 'old', 'ones', 'new', 'set']);

/** Significant word stems: four letters or more, a plural "s" dropped. */
function stems(text: string): Set<string> {
  const words = text.toLowerCase().match(/[a-z]+/g) ?? [];
  return new Set(words.filter((w) => w.length >= 4 && !STOP_WORDS.has(w)).map((w) => w.replace(/(?<=\w{3})s$/, '')));
}

/**
 * The option an operation most likely answers, by shared words with each alternative (ignoring the
 * words of the choice's own name, which all its alternatives share); '' when none or a tie.
 */
export function suggestOptionKey(operationName: string, options: readonly EstimateOptionInput[]): string {
  const words = stems(operationName);
  const scored = options.map((o) => {
    const own = stems(o.choice);
    const score = [...stems(o.name)].filter((w) => !own.has(w) && words.has(w)).length;
    return { key: o.key, score };
  });
  const best = Math.max(0, ...scored.map((s) => s.score));
  const top = scored.filter((s) => s.score === best);
  return best > 0 && top.length === 1 ? top[0]!.key : '';
}

/**
 * The first proposal: each operation once (with every component it remedies), ticked when it is
 * the only remedy offered for a component or when it matches one of the client's alternatives.
 */
export function initialItems(proposal: EstimateProposal): DraftItem[] {
  const options = optionsFromChoices(proposal.choices);
  const items = new Map<string, DraftItem>();
  for (const component of proposal.components) {
    for (const op of component.operations) {
      const existing = items.get(op.id);
      if (existing) {
        existing.componentIds.push(component.componentId);
        existing.isTicked ||= component.operations.length === 1;
        continue;
      }
      const optionKey = suggestOptionKey(op.name, options);
      items.set(op.id, { id: op.id, operationId: op.id, name: op.name, componentIds: [component.componentId], isTicked: component.operations.length === 1 || optionKey !== '', optionKey, lines: null });
    }
  }
  return [...items.values()];
}

/** A catalogue line in the form the assessor edits (sublet supplier folded into the words, as on the estimate). */
export function draftLineOf(line: CatalogueLine, currency: string): DraftLine {
  const description = line.kind === 'sublet' && line.supplier ? `${line.description} (${line.supplier})` : line.description;
  return {
    kind: line.kind,
    description,
    hoursText: line.minutes === null ? '' : formatHoursMinutes(line.minutes),
    quantityText: line.quantityMilli === null ? '1' : formatQuantityMilli(line.quantityMilli),
    priceText: line.kind === 'sublet' && line.unitPriceMinor != null ? moneyInputText(line.unitPriceMinor, currency) : '',
    partId: line.part?.id ?? null,
    unit: line.part?.unit ?? '',
    unitCostMinor: line.unitCostMinor ?? null,
  };
}

export const blankLine = (kind: DraftLine['kind']): DraftLine => ({ kind, description: '', hoursText: '', quantityText: '1', priceText: '', partId: null, unit: '', unitCostMinor: null });

function lineInput(line: DraftLine, at: string, currency: string, fields: FieldErrors): EstimateLineInput | null {
  const fail = (name: string, message: string) => void (fields[`${at}.${name}`] = [message]);
  const description = line.description.trim();
  if (line.kind !== 'part' && description === '') fail('description', 'Describe the work');
  if (line.kind === 'labour') {
    const minutes = parseHoursInput(line.hoursText);
    if (!minutes.ok) return fail('hours', minutes.message), null;
    if (minutes.value < 1) return fail('hours', 'Hours must be above zero'), null;
    return description ? { kind: 'labour', description, minutes: minutes.value } : null;
  }
  const quantity = parseQuantityInput(line.quantityText);
  if (!quantity.ok) fail('quantity', quantity.message);
  if (line.kind === 'part') {
    return quantity.ok && line.partId ? { kind: 'part', partId: line.partId, description: description || undefined, quantityMilli: quantity.value } : null;
  }
  const price = parseMoneyInput(line.priceText, currency);
  if (!price.ok) fail('price', price.message);
  if (!quantity.ok || !price.ok || !description) return null;
  const cost = line.unitCostMinor === null ? {} : { unitCostMinor: line.unitCostMinor };
  return { kind: line.kind, description, quantityMilli: quantity.value, unitPriceMinor: price.value, ...cost };
}

type BuildResult = { ok: true; input: CreateSurveyEstimateInput } | { ok: false; fields: FieldErrors; problems: string[] };

/**
 * The request for `POST /api/surveys/:id/estimate`. Ticked items only; a choice goes in as options
 * (all its alternatives, so the client has them all) once any ticked work is put in one of them.
 */
export function buildEstimateInput(items: readonly DraftItem[], choices: readonly SurveyChoice[], text: { title: string; notes: string }, currency: string): BuildResult {
  const fields: FieldErrors = {};
  const problems: string[] = [];
  const ticked = items.filter((i) => i.isTicked);
  if (ticked.length === 0) problems.push('Tick at least one piece of work');
  const allOptions = optionsFromChoices(choices);
  const usedChoices = new Set(ticked.flatMap((i) => allOptions.filter((o) => o.key === i.optionKey).map((o) => o.choice)));
  const options = allOptions.filter((o) => usedChoices.has(o.choice));
  const requestItems = ticked.map((item) => {
    const optionKey = options.some((o) => o.key === item.optionKey) ? item.optionKey : null;
    const base = { componentIds: item.componentIds, optionKey };
    if (item.lines === null && item.operationId) return { ...base, operationId: item.operationId };
    const lines = (item.lines ?? []).map((line, n) => lineInput(line, `items.${item.id}.lines.${n}`, currency, fields));
    if ((item.lines ?? []).length === 0) problems.push(`Add at least one line to “${item.name || 'the added work'}”`);
    return { ...base, ...(item.operationId ? { operationId: item.operationId } : {}), lines: lines.filter((l): l is EstimateLineInput => l !== null) };
  });
  if (problems.length > 0 || Object.keys(fields).length > 0) return { ok: false, fields, problems };
  const title = text.title.trim();
  return { ok: true, input: { ...(title ? { title } : {}), notes: text.notes.trim(), options, items: requestItems } };
}

/** Labour in the ticked work, in minutes, using edited lines where the assessor changed them. */
export function tickedLabourMinutes(items: readonly DraftItem[], operations: ReadonlyMap<string, CatalogueOperation>): number {
  return items
    .filter((i) => i.isTicked)
    .reduce((sum, item) => {
      if (item.lines === null) return sum + (item.operationId ? (operations.get(item.operationId)?.labourMinutes ?? 0) : 0);
      return sum + item.lines.reduce((s, l) => { const m = l.kind === 'labour' ? parseHoursInput(l.hoursText) : null; return s + (m?.ok ? m.value : 0); }, 0);
    }, 0);
}
