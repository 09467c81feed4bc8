import type { ReactNode } from 'react';
import { formatLengthMm, type PianoDetail } from '@keybed/shared';
import { IvoryCaution } from '@/components/ivory-caution';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { useLengthUnit } from '@/lib/length-unit';
import { PIANO_TYPE_LABELS } from '@/lib/piano';
import { KEYTOP_OPTIONS } from '../lib/piano-form-values';

/** What the workshop knows about one piano; the ivory caution shows when its keytops are ivory. */
export function PianoDetails({ piano }: { piano: PianoDetail }) {
  const unit = useLengthUnit();
  const keytops = KEYTOP_OPTIONS.find((o) => o.value === piano.keytopMaterial)?.label ?? piano.keytopMaterial;
  const size = piano.sizeMm === null ? null : `${formatLengthMm(piano.sizeMm, unit)} (${formatLengthMm(piano.sizeMm, 'mm')})`;
  const rows: Array<[string, ReactNode]> = [
    ['Owner', <TextLink key="owner" to={paths.client.build(piano.clientId)}>{piano.clientName}</TextLink>],
    ['Type', PIANO_TYPE_LABELS[piano.type]],
    ['Size', size],
    ['Serial number', piano.serialNumber || null],
    ['Year, roughly', piano.yearApprox ? `c. ${piano.yearApprox}` : null],
    ['Case finish', piano.caseFinish || null],
    ['Keytops', keytops],
  ];
  return (
    <div className="space-y-4">
      {piano.keytopMaterial === 'ivory' && <IvoryCaution />}
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-[10rem_1fr]">
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="font-semibold text-graphite-700">{label}</dt>
            <dd className={value ? 'tabular-figures' : 'text-graphite-600'}>{value ?? 'Not recorded'}</dd>
          </div>
        ))}
      </dl>
      {piano.notes && (
        <div>
          <h3 className="font-semibold text-graphite-700">Notes</h3>
          <p className="mt-1 whitespace-pre-line">{piano.notes}</p>
        </div>
      )}
    </div>
  );
}
