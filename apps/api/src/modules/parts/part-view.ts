import { averageUnitCostMinor, priceFromCostAndMarkup, type Part, type Role, type StockMovement } from '@keybed/shared';
import { seesCosts, seesPrices } from '../../http/money-access';
import type { MovementRow, PartRow } from './parts.repo';

/** The sell price of one unit: the fixed price, or cost plus markup rounded half-up. */
export const sellPriceOf = (p: { unitCostMinor: number; sellPriceMinor: number | null; markupBasisPoints: number | null }) =>
  p.sellPriceMinor ?? priceFromCostAndMarkup(p.unitCostMinor, p.markupBasisPoints ?? 0);

/** A part as the role may see it: the foreman sell prices, the owner costs too, technicians neither. */
export function toPart(role: Role, p: PartRow): Part {
  const onHandMilli = Number(p.onHandMilli);
  const stock = { quantityMilli: onHandMilli, valueMinor: Number(p.stockValueMinor) };
  return {
    id: p.id,
    sku: p.sku,
    name: p.name,
    unit: p.unit,
    supplier: p.supplier,
    reorderLevelMilli: p.reorderLevelMilli,
    isActive: p.isActive,
    onHandMilli,
    isLowStock: onHandMilli <= p.reorderLevelMilli,
    ...(seesPrices(role) ? { sellPriceMinor: sellPriceOf(p) } : {}),
    ...(seesCosts(role)
      ? { unitCostMinor: p.unitCostMinor, markupBasisPoints: p.markupBasisPoints, averageUnitCostMinor: averageUnitCostMinor(stock), stockValueMinor: stock.valueMinor }
      : {}),
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

export function toMovement(role: Role, m: MovementRow): StockMovement {
  return {
    id: m.id,
    partId: m.partId,
    kind: m.kind,
    quantityMilli: m.quantityMilli,
    task: m.task?.id ? m.task : null,
    job: m.job?.id ? m.job : null,
    reason: m.reason,
    by: m.by?.id ? m.by : null,
    at: m.at.toISOString(),
    ...(seesCosts(role) ? { unitCostMinor: m.unitCostMinor, valueMinor: m.valueMinor } : {}),
  };
}
