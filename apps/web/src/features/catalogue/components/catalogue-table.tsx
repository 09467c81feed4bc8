import { formatHoursMinutes, type CatalogueOperation } from '@keybed/shared';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { formatMinor } from '@/lib/money';
import { COMPONENT_CHOICES } from '../lib/operation-form';

const componentName = new Map(COMPONENT_CHOICES.map((c) => [c.key, c.name]));
const PIANO_TYPE = { grand: 'Grand', upright: 'Upright' } as const;

/** The workshop's standard operations: what each remedies, its labour and its price ex VAT where the role sees prices. */
export function CatalogueTable({ operations, currency }: { operations: CatalogueOperation[]; currency: string }) {
  const hasPrices = operations.some((o) => o.netMinor !== undefined);
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full text-left">
        <caption className="sr-only">Work catalogue</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100 text-sm">
          <tr>
            <th scope="col" className="px-4 py-2 font-semibold">Operation</th>
            <th scope="col" className="px-4 py-2 font-semibold">For</th>
            <th scope="col" className="px-4 py-2 font-semibold">Remedies</th>
            <th scope="col" className="px-4 py-2 text-right font-semibold">Labour</th>
            {hasPrices && <th scope="col" className="px-4 py-2 text-right font-semibold">Price ex VAT</th>}
          </tr>
        </thead>
        <tbody className="divide-y divide-graphite-200">
          {operations.map((op) => (
            <tr key={op.id} className={op.isActive ? undefined : 'text-graphite-600'}>
              <th scope="row" className="px-4 py-3 font-normal">
                <TextLink to={paths.catalogueOperation.build(op.id)}>{op.name}</TextLink>
                {!op.isActive && <span className="ml-2 rounded bg-graphite-200 px-1.5 text-sm">Not in use</span>}
              </th>
              <td className="px-4 py-3">{op.pianoType ? PIANO_TYPE[op.pianoType] : 'Any piano'}</td>
              <td className="px-4 py-3 text-sm">{op.componentKeys.map((k) => componentName.get(k) ?? k).join(', ') || '—'}</td>
              <td className="px-4 py-3 text-right tabular-figures">{formatHoursMinutes(op.labourMinutes)} h</td>
              {hasPrices && <td className="px-4 py-3 text-right tabular-figures">{op.netMinor === undefined ? '—' : formatMinor(op.netMinor, currency)}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
