/**
 * Moving weighted-average cost of a stocked part. The stock holds its total value in minor units,
 * so issuing everything leaves exactly zero and no rounding drift builds up.
 */
import { lineAmountMinor, roundHalfUp } from './money';

/** Stock of one part: quantity in thousandths of its unit, value in minor units. */
export interface StockValue {
  quantityMilli: number;
  valueMinor: number;
}

/** No stock, no value. */
export const EMPTY_STOCK: StockValue = { quantityMilli: 0, valueMinor: 0 };

/**
 * Adds a receipt: quantity grows by quantityMilli and value by quantity × unit cost (rounded half
 * away from zero to the minor unit, as {@link lineAmountMinor}). quantityMilli must be > 0.
 */
export function receiveStock(stock: StockValue, quantityMilli: number, unitCostMinor: number): StockValue {
  if (!(quantityMilli > 0)) throw new RangeError('A receipt must add a positive quantity');
  return {
    quantityMilli: stock.quantityMilli + quantityMilli,
    valueMinor: stock.valueMinor + lineAmountMinor(quantityMilli, unitCostMinor),
  };
}

/**
 * Issues quantityMilli at the current average: cost = value × issued / on hand, rounded half away
 * from zero; issuing all that is on hand costs exactly the remaining value. Throws RangeError
 * when the quantity is not positive or more than is on hand.
 */
export function issueStock(stock: StockValue, quantityMilli: number): { stock: StockValue; costMinor: number } {
  if (!(quantityMilli > 0)) throw new RangeError('An issue must take a positive quantity');
  if (quantityMilli > stock.quantityMilli) throw new RangeError('Cannot issue more than is on hand');
  const costMinor =
    quantityMilli === stock.quantityMilli
      ? stock.valueMinor
      : roundHalfUp(BigInt(stock.valueMinor) * BigInt(quantityMilli), BigInt(stock.quantityMilli));
  return { stock: { quantityMilli: stock.quantityMilli - quantityMilli, valueMinor: stock.valueMinor - costMinor }, costMinor };
}

/** Average cost of one whole unit in minor units (value × 1000 / quantityMilli, half-up); null when none on hand. */
export function averageUnitCostMinor(stock: StockValue): number | null {
  return stock.quantityMilli > 0 ? roundHalfUp(BigInt(stock.valueMinor) * 1000n, BigInt(stock.quantityMilli)) : null;
}

/**
 * Issues quantityMilli where the workshop lets stock go below zero. Up to what is on hand it is
 * {@link issueStock}; the shortfall is costed at the average unit cost before the issue, or at
 * `fallbackUnitCostMinor` (the catalogue cost) when nothing was on hand, rounded half-up.
 */
export function issueStockAllowingShortfall(stock: StockValue, quantityMilli: number, fallbackUnitCostMinor: number): { stock: StockValue; costMinor: number } {
  if (!(quantityMilli > 0)) throw new RangeError('An issue must take a positive quantity');
  const onHand = Math.max(0, stock.quantityMilli);
  if (quantityMilli <= onHand) return issueStock(stock, quantityMilli);
  const unitCost = averageUnitCostMinor(stock) ?? fallbackUnitCostMinor;
  const fromStock = onHand > 0 ? stock.valueMinor : 0;
  const costMinor = fromStock + lineAmountMinor(quantityMilli - onHand, unitCost);
  return { stock: { quantityMilli: stock.quantityMilli - quantityMilli, valueMinor: stock.valueMinor - costMinor }, costMinor };
}
