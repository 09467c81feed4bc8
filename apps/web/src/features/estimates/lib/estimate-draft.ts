import {
  estimateLineAmountMinor,
  estimateTotals,
  formatHoursMinutes,
  formatQuantityMilli,
  type Estimate,
  type EstimateLineInput,
  type EstimateLineKind,
  type FieldErrors,
  type InvoiceTotals,
} from '@keybed/shared';
import { moneyInputText, parseHoursInput, parseMoneyInput, parseQuantityInput, type Parsed } from '@/lib/money';

/** An option as edited: its stable key, the choice it answers ("Hammers") and its name. */
export interface OptionDraft {
  key: string;
  choice: string;
  name: string;
}

/** A line as typed. `uid` is the editor's own handle; `id` the stored line's, kept so its hidden cost stays. */
export interface LineDraft {
  uid: string;
  id?: string | undefined;
  kind: EstimateLineKind;
  optionKey: string | null;
  description: string;
  /** Labour: the task it budgets, or '' for a new task made on acceptance. */
  taskId: string;
  hours: string;
  partId: string;
  quantity: string;
  /** The price of one unit, or of an hour for labour. */
  unitPrice: string;
  /** Owner only, sublet and other lines: the expected cost of one unit; '' when not known. */
  unitCost: string;
}

export interface EstimateDraft {
  title: string;
  notes: string;
  options: OptionDraft[];
  lines: LineDraft[];
}

/** What the editor knows about the catalogue to price a part line. */
export interface CataloguePart {
  id: string;
  name: string;
  unit: string;
  sellPriceMinor?: number | undefined;
}

let counter = 0;
/** A key unique within this editor (and valid as an option key). */
export const newKey = (prefix: string) => `${prefix}-${Date.now().toString(36)}${(counter++).toString(36)}`;

export function draftFromEstimate(estimate: Estimate, currency: string): EstimateDraft {
  const money = (minor: number | null | undefined) => (minor === null || minor === undefined ? '' : moneyInputText(minor, currency));
  return {
    title: estimate.title,
    notes: estimate.notes,
    options: estimate.options.map((o) => ({ key: o.key, choice: o.choice, name: o.name })),
    lines: estimate.lines.map((l) => ({
      uid: l.id,
      id: l.id,
      kind: l.kind,
      optionKey: l.optionKey,
      description: l.description,
      taskId: l.task?.id ?? '',
      hours: l.minutes === null ? '' : formatHoursMinutes(l.minutes),
      partId: l.part?.id ?? '',
      quantity: l.quantityMilli === null ? '' : formatQuantityMilli(l.quantityMilli),
      unitPrice: money(l.unitPriceMinor),
      unitCost: money(l.unitCostMinor),
    })),
  };
}

/** A fresh line of a kind, priced from the workshop's charge-out rate or the catalogue. */
export function newLine(kind: EstimateLineKind, optionKey: string | null, ctx: { labourRateMinorPerHour?: number | undefined; part?: CataloguePart | undefined; currency: string }): LineDraft {
  const price = (minor: number | undefined) => (minor === undefined ? '' : moneyInputText(minor, ctx.currency));
  return {
    uid: newKey('line'),
    kind,
    optionKey,
    description: '',
    taskId: '',
    hours: '',
    partId: kind === 'part' ? (ctx.part?.id ?? '') : '',
    quantity: kind === 'labour' ? '' : '1',
    unitPrice: kind === 'labour' ? price(ctx.labourRateMinorPerHour) : kind === 'part' ? price(ctx.part?.sellPriceMinor) : '',
    unitCost: '',
  };
}

/** Options grouped by the choice they answer, in the order first seen (choices match without case). */
export function choicesOf(options: readonly OptionDraft[]): Array<{ choice: string; options: OptionDraft[] }> {
  const groups = new Map<string, { choice: string; options: OptionDraft[] }>();
  for (const option of options) {
    const id = option.choice.trim().toLowerCase();
    const group = groups.get(id) ?? { choice: option.choice, options: [] };
    group.options.push(option);
    groups.set(id, group);
  }
  return [...groups.values()];
}

/** The first option of each choice: what the totals show until someone picks. */
export const defaultChosenKeys = (options: readonly OptionDraft[]) => choicesOf(options).flatMap((c) => (c.options[0] ? [c.options[0].key] : []));

/** A line's minutes or quantity and price as the shared arithmetic takes them; null while not readable. */
function figuresOf(line: LineDraft, currency: string) {
  const price = parseMoneyInput(line.unitPrice, currency);
  if (!price.ok) return null;
  if (line.kind === 'labour') {
    const minutes = parseHoursInput(line.hours);
    return minutes.ok ? { kind: line.kind, minutes: minutes.value, quantityMilli: null, unitPriceMinor: price.value, unitCostMinor: null, optionId: line.optionKey } : null;
  }
  const quantity = parseQuantityInput(line.quantity);
  return quantity.ok ? { kind: line.kind, minutes: null, quantityMilli: quantity.value, unitPriceMinor: price.value, unitCostMinor: null, optionId: line.optionKey } : null;
}

export interface DraftTotals {
  /** Each line's amount by uid; null while the line cannot be read. */
  lineAmounts: Map<string, number | null>;
  /** Net of each option's own lines, by key. */
  optionNets: Map<string, number>;
  /** Net of the lines in every version (no option). */
  baseNet: number;
  /** Totals with the chosen options, by the shared money rule. */
  totals: InvoiceTotals;
  /** Lines left out of the totals because something in them cannot be read yet. */
  unreadableCount: number;
}

/** Live totals of a draft, computed with the same functions the server uses. */
export function draftTotals(draft: EstimateDraft, chosenKeys: readonly string[], taxRateBasisPoints: number, currency: string): DraftTotals {
  const lineAmounts = new Map<string, number | null>();
  const readable = [];
  for (const line of draft.lines) {
    const figures = figuresOf(line, currency);
    lineAmounts.set(line.uid, figures ? estimateLineAmountMinor(figures) : null);
    if (figures) readable.push(figures);
  }
  const optionNets = new Map(draft.options.map((o) => [o.key, 0]));
  let baseNet = 0;
  for (const line of draft.lines) {
    const amount = lineAmounts.get(line.uid) ?? 0;
    if (line.optionKey === null) baseNet += amount;
    else optionNets.set(line.optionKey, (optionNets.get(line.optionKey) ?? 0) + amount);
  }
  return {
    lineAmounts,
    optionNets,
    baseNet,
    totals: estimateTotals(readable, chosenKeys, taxRateBasisPoints),
    unreadableCount: draft.lines.length - readable.length,
  };
}

type Result = { data: { title: string; notes: string; options: OptionDraft[]; lines: EstimateLineInput[] }; fields?: undefined } | { data?: undefined; fields: FieldErrors };

/**
 * The draft as the API's `options` and `lines`, with problems keyed like the API's own field
 * errors (`lines.3.minutes`), so both land on the same inputs. Costs are sent only by the owner.
 */
export function draftContent(draft: EstimateDraft, currency: string, canSeeCosts: boolean): Result {
  const fields: FieldErrors = {};
  const read = <T>(name: string, parsed: Parsed<T>): T | undefined => (parsed.ok ? parsed.value : ((fields[name] = [parsed.message]), undefined));
  draft.options.forEach((o, i) => {
    if (!o.name.trim()) fields[`options.${i}.name`] = ['Name the option'];
    if (!o.choice.trim()) fields[`options.${i}.choice`] = ['Say what the client chooses'];
  });
  for (const choice of choicesOf(draft.options)) {
    if (choice.options.length < 2) fields[`options.${draft.options.indexOf(choice.options[0]!)}.choice`] = ['A choice needs at least two options'];
  }
  const lines = draft.lines.map((line, i): EstimateLineInput | undefined => {
    const at = (name: string) => `lines.${i}.${name}`;
    const common = { ...(line.id ? { id: line.id } : {}), optionKey: line.optionKey };
    const description = line.description.trim();
    if (line.kind !== 'part' && !description) fields[at('description')] = ['Describe the work'];
    const unitPriceMinor = read(at('unitPriceMinor'), parseMoneyInput(line.unitPrice, currency));
    if (line.kind === 'labour') {
      const minutes = read(at('minutes'), parseHoursInput(line.hours));
      if (minutes === undefined || unitPriceMinor === undefined) return undefined;
      return { ...common, kind: 'labour', description, taskId: line.taskId || null, minutes, unitPriceMinor };
    }
    const quantityMilli = read(at('quantityMilli'), parseQuantityInput(line.quantity));
    if (line.kind === 'part') {
      if (!line.partId) fields[at('partId')] = ['Choose a part'];
      if (quantityMilli === undefined || unitPriceMinor === undefined || !line.partId) return undefined;
      return { ...common, kind: 'part', partId: line.partId, ...(description ? { description } : {}), quantityMilli, unitPriceMinor };
    }
    const unitCostMinor = canSeeCosts && line.unitCost.trim() !== '' ? read(at('unitCostMinor'), parseMoneyInput(line.unitCost, currency)) : undefined;
    if (quantityMilli === undefined || unitPriceMinor === undefined || !description) return undefined;
    return { ...common, kind: line.kind, description, quantityMilli, unitPriceMinor, ...(unitCostMinor !== undefined ? { unitCostMinor } : {}) };
  });
  if (Object.keys(fields).length > 0) return { fields };
  return {
    data: {
      title: draft.title.trim(),
      notes: draft.notes.trim(),
      options: draft.options.map((o) => ({ key: o.key, choice: o.choice.trim(), name: o.name.trim() })),
      lines: lines as EstimateLineInput[],
    },
  };
}

export const LINE_KIND_LABELS: Record<EstimateLineKind, string> = { labour: 'Labour', part: 'Part', sublet: 'Sublet', other: 'Other' };
