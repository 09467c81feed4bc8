/**
 * Estimate arithmetic: line amounts, the lines in scope for a choice of options, and totals.
 * Money in integer minor units; the rounding rule is money.ts's (each line half-up, tax once on
 * the total net).
 */
import { lineAmountMinor, roundHalfUp, taxMinor, type InvoiceTotals, type RoundingRule } from './money';

/** A line as the arithmetic needs it. Labour has minutes and an hourly price; others a quantity in thousandths. */
export interface EstimateLineFigures {
  kind: 'labour' | 'part' | 'sublet' | 'other';
  minutes: number | null;
  quantityMilli: number | null;
  unitPriceMinor: number;
  unitCostMinor: number | null;
  /** Null: always included. */
  optionId: string | null;
}

/** An option and the choice it answers (options of one choice are alternatives). */
export interface EstimateOptionFigures {
  id: string;
  choice: string;
}

/**
 * Amount of one line in minor units, rounded half away from zero: labour = minutes × hourly price
 * / 60; other kinds = quantity (thousandths) × unit price / 1000 ({@link lineAmountMinor}).
 */
export function estimateLineAmountMinor(line: EstimateLineFigures): number {
  if (line.kind === 'labour') return roundHalfUp(BigInt(line.minutes ?? 0) * BigInt(line.unitPriceMinor), 60n);
  return lineAmountMinor(line.quantityMilli ?? 0, line.unitPriceMinor);
}

/** Expected cost of a non-labour line = quantity × unit cost, half-up; null for labour or an unknown cost. */
export function estimateLineCostMinor(line: EstimateLineFigures): number | null {
  if (line.kind === 'labour' || line.unitCostMinor === null) return null;
  return lineAmountMinor(line.quantityMilli ?? 0, line.unitCostMinor);
}

/** The options in scope before the client chooses: the first option (in the given order) of each choice. */
export function defaultOptionIds(options: readonly EstimateOptionFigures[]): string[] {
  const seen = new Set<string>();
  return options.filter((o) => !seen.has(o.choice.toLowerCase()) && seen.add(o.choice.toLowerCase())).map((o) => o.id);
}

/**
 * Problems with a client's choice, or [] when it is valid: every id must be an option of the
 * estimate and every choice must have exactly one chosen option.
 */
export function optionChoiceProblems(options: readonly EstimateOptionFigures[], chosenIds: readonly string[]): string[] {
  const byId = new Map(options.map((o) => [o.id, o]));
  const problems: string[] = [];
  if (chosenIds.some((id) => !byId.has(id))) problems.push('Choose only options of this estimate');
  const chosenPerChoice = new Map<string, number>();
  for (const id of chosenIds) {
    const option = byId.get(id);
    if (option) chosenPerChoice.set(option.choice.toLowerCase(), (chosenPerChoice.get(option.choice.toLowerCase()) ?? 0) + 1);
  }
  for (const choice of new Set(options.map((o) => o.choice))) {
    const n = chosenPerChoice.get(choice.toLowerCase()) ?? 0;
    if (n !== 1) problems.push(n === 0 ? `Choose an option for "${choice}"` : `Choose only one option for "${choice}"`);
  }
  return problems;
}

/** Lines that count for the chosen options: those with no option and those of a chosen one. */
export function linesInScope<L extends Pick<EstimateLineFigures, 'optionId'>>(lines: readonly L[], chosenOptionIds: readonly string[]): L[] {
  const chosen = new Set(chosenOptionIds);
  return lines.filter((l) => l.optionId === null || chosen.has(l.optionId));
}

/**
 * Totals for the chosen options: net = the sum of the in-scope lines' rounded amounts; tax is taken
 * once on that net by `rule` ({@link taxMinor}); gross = net + tax.
 */
export function estimateTotals(
  lines: readonly EstimateLineFigures[],
  chosenOptionIds: readonly string[],
  taxRateBasisPoints: number,
  rule: RoundingRule = 'half-up',
): InvoiceTotals {
  const netMinor = linesInScope(lines, chosenOptionIds).reduce((sum, line) => sum + estimateLineAmountMinor(line), 0);
  const tax = taxMinor(netMinor, taxRateBasisPoints, rule);
  return { netMinor, taxMinor: tax, grossMinor: netMinor + tax };
}
