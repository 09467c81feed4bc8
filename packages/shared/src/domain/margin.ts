/**
 * Markup and margin. Money in integer minor units; ratios as plain numbers for display
 * (0.25 = 25 %); ratios given as inputs for pricing are integer basis points (2500 = 25 %) so the
 * price comes out exact.
 */
import { roundHalfUp } from './money';

/** Profit in minor units = price − cost. */
export function profitMinor(costMinor: number, priceMinor: number): number {
  return priceMinor - costMinor;
}

/**
 * Markup ratio = profit / cost (cost £100, price £125 → 0.25). Null when cost ≤ 0, where markup has
 * no meaning. A price below cost gives a negative markup.
 */
export function markup(costMinor: number, priceMinor: number): number | null {
  return costMinor > 0 ? (priceMinor - costMinor) / costMinor : null;
}

/**
 * Margin ratio = profit / price (cost £100, price £125 → 0.20). Null when price ≤ 0 (nothing sold,
 * or a credit). A price below cost gives a negative margin; it is never above 1 while cost ≥ 0.
 */
export function margin(costMinor: number, priceMinor: number): number | null {
  return priceMinor > 0 ? (priceMinor - costMinor) / priceMinor : null;
}

/** Margin ratio from a markup ratio: m / (1 + m). Null when m ≤ −1 (the price would be zero or negative). */
export function marginFromMarkup(markupRatio: number): number | null {
  return markupRatio > -1 ? markupRatio / (1 + markupRatio) : null;
}

/** Markup ratio from a margin ratio: g / (1 − g). Null when g ≥ 1 (no finite price gives it). */
export function markupFromMargin(marginRatio: number): number | null {
  return marginRatio < 1 ? marginRatio / (1 - marginRatio) : null;
}

/**
 * Price in minor units = cost × (1 + markup), markup in basis points (2500 = 25 %), rounded half
 * away from zero to the minor unit. Throws RangeError for markup below −100 %.
 */
export function priceFromCostAndMarkup(costMinor: number, markupBasisPoints: number): number {
  if (markupBasisPoints < -10_000) throw new RangeError('Markup cannot be below −100 %');
  return roundHalfUp(BigInt(costMinor) * BigInt(10_000 + markupBasisPoints), 10_000n);
}

/**
 * Price in minor units = cost / (1 − margin), margin in basis points (2000 = 20 %), rounded half
 * away from zero to the minor unit. Throws RangeError for a margin of 100 % or more.
 */
export function priceFromCostAndMargin(costMinor: number, marginBasisPoints: number): number {
  if (marginBasisPoints >= 10_000) throw new RangeError('Margin must be below 100 %');
  return roundHalfUp(BigInt(costMinor) * 10_000n, BigInt(10_000 - marginBasisPoints));
}
