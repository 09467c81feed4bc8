import { useState, type ReactNode } from 'react';
import type { PartDetail as PartDetailData } from '@keybed/shared';
import { Button } from '@/components/button';
import { formatBasisPoints, formatMinor } from '@/lib/money';
import { quantityWithUnit } from '../lib/part-form';
import { LowStockBadge } from './low-stock-badge';
import { PartForm } from './part-form';
import { StockLedger } from './stock-ledger';
import { AdjustStockForm, ReceiveStockForm } from './stock-forms';

interface PartDetailProps {
  part: PartDetailData;
  currency: string;
  /** Owner and foreman receive deliveries and adjust counts. */
  canRecord: boolean;
  /** The owner edits the catalogue entry. */
  canEdit: boolean;
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-sm font-semibold text-graphite-700">{label}</dt>
      <dd className="text-lg tabular-figures">{children}</dd>
    </div>
  );
}

/** One part: stock on hand, its prices as the role may see them, stock forms and its ledger. */
export function PartDetail({ part, currency, canRecord, canEdit }: PartDetailProps) {
  const [isEditing, setEditing] = useState(false);
  return (
    <div className="space-y-8">
      <dl className="grid grid-cols-2 gap-4 rounded-lg border border-graphite-300 bg-white p-4 sm:grid-cols-4">
        <Fact label="On hand">
          <span className="inline-flex flex-wrap items-center gap-2">
            {quantityWithUnit(part.onHandMilli, part.unit)}
            {part.isLowStock && <LowStockBadge />}
          </span>
        </Fact>
        <Fact label="Reorder at">{part.reorderLevelMilli === 0 ? 'Not set' : quantityWithUnit(part.reorderLevelMilli, part.unit)}</Fact>
        {part.sellPriceMinor !== undefined && (
          <Fact label="Sell price">
            {formatMinor(part.sellPriceMinor, currency)}
            {part.markupBasisPoints != null && <span className="block text-sm text-graphite-600">cost + {formatBasisPoints(part.markupBasisPoints)}</span>}
          </Fact>
        )}
        {part.unitCostMinor !== undefined && <Fact label="Catalogue cost">{formatMinor(part.unitCostMinor, currency)}</Fact>}
        {part.averageUnitCostMinor !== undefined && <Fact label="Average cost in stock">{part.averageUnitCostMinor === null ? 'None in stock' : formatMinor(part.averageUnitCostMinor, currency)}</Fact>}
        {part.stockValueMinor !== undefined && <Fact label="Stock value">{formatMinor(part.stockValueMinor, currency)}</Fact>}
        <Fact label="Supplier">{part.supplier || 'Not recorded'}</Fact>
        <Fact label="SKU">
          <span className="font-mono text-base">{part.sku}</span>
        </Fact>
      </dl>
      {part.averageUnitCostMinor !== undefined && (
        <p className="max-w-prose text-sm text-graphite-600">
          Parts used are costed at the weighted average cost of the stock at that moment (each delivery at its own cost), and that cost is kept on the movement.
        </p>
      )}
      {canEdit && (
        <section aria-labelledby="part-edit-heading" className="space-y-3">
          <div className="flex items-center gap-3">
            <h2 id="part-edit-heading" className="text-lg font-semibold">Catalogue entry</h2>
            <Button size="sm" variant="secondary" aria-expanded={isEditing} onClick={() => setEditing((v) => !v)}>
              {isEditing ? 'Close without saving' : 'Edit the part'}
            </Button>
          </div>
          {isEditing && <PartForm currency={currency} part={part} onSaved={() => setEditing(false)} />}
        </section>
      )}
      {canRecord && (
        <section aria-labelledby="part-stock-heading" className="space-y-3">
          <h2 id="part-stock-heading" className="text-lg font-semibold">Stock</h2>
          <div className="grid gap-4 md:grid-cols-2">
            <ReceiveStockForm part={part} currency={currency} />
            <AdjustStockForm part={part} />
          </div>
        </section>
      )}
      <section aria-labelledby="part-ledger-heading" className="space-y-3">
        <h2 id="part-ledger-heading" className="text-lg font-semibold">Stock ledger</h2>
        <StockLedger movements={part.movements} unit={part.unit} currency={currency} />
      </section>
    </div>
  );
}
