import { formatLengthMm, type JobDetail } from '@keybed/shared';
import type { ReactNode } from 'react';
import { IvoryCaution } from '@/components/ivory-caution';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { useLengthUnit } from '@/lib/length-unit';
import { PIANO_TYPE_LABELS, pianoName } from '@/lib/piano';

function Facts({ rows }: { rows: Array<[string, ReactNode]> }) {
  return (
    <dl className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-2 text-sm">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-graphite-700">{label}</dt>
          <dd className={value ? 'break-words tabular-figures' : 'text-graphite-600'}>{value || 'Not recorded'}</dd>
        </div>
      ))}
    </dl>
  );
}

const panel = 'space-y-3 rounded-lg border border-graphite-300 bg-white p-4';

/** The piano and the client behind a job, each linking to its own page. */
export function JobFacts({ job }: { job: JobDetail }) {
  const unit = useLengthUnit();
  const { piano, client } = job;
  return (
    <div className="grid content-start gap-4 self-start sm:grid-cols-2 lg:grid-cols-1">
      <section aria-labelledby="job-piano-heading" className={panel}>
        <h2 id="job-piano-heading" className="font-semibold">
          Piano: <TextLink to={paths.piano.build(piano.id)}>{pianoName(piano)}</TextLink>
        </h2>
        <Facts
          rows={[
            ['Type', PIANO_TYPE_LABELS[piano.type]],
            ['Size', piano.sizeMm === null ? null : formatLengthMm(piano.sizeMm, unit)],
            ['Serial number', piano.serialNumber],
            ['Year, roughly', piano.yearApprox ? `c. ${piano.yearApprox}` : null],
            ['Case finish', piano.caseFinish],
          ]}
        />
        {piano.keytopMaterial === 'ivory' && <IvoryCaution className="text-sm" />}
      </section>
      <section aria-labelledby="job-client-heading" className={panel}>
        <h2 id="job-client-heading" className="font-semibold">
          Client: <TextLink to={paths.client.build(client.id)}>{client.name}</TextLink>
        </h2>
        <Facts
          rows={[
            ['E-mail', client.email ? <a className="underline" href={`mailto:${client.email}`}>{client.email}</a> : null],
            ['Phone', client.phone ? <a className="underline" href={`tel:${client.phone}`}>{client.phone}</a> : null],
          ]}
        />
      </section>
    </div>
  );
}
