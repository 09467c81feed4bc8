import type { ClientDetail } from '@keybed/shared';

/** Contact details and notes, as a description list; empty ones say so rather than vanish. */
export function ClientDetails({ client }: { client: ClientDetail }) {
  const rows: Array<[string, string | null]> = [
    ['E-mail', client.email],
    ['Phone', client.phone],
    ['Postal address', client.address],
  ];
  return (
    <div className="space-y-4">
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-[10rem_1fr]">
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="font-semibold text-graphite-700">{label}</dt>
            <dd className={value ? 'break-words whitespace-pre-line' : 'text-graphite-600'}>{value ?? 'Not recorded'}</dd>
          </div>
        ))}
      </dl>
      {client.notes && (
        <div>
          <h3 className="font-semibold text-graphite-700">Notes</h3>
          <p className="mt-1 whitespace-pre-line">{client.notes}</p>
        </div>
      )}
    </div>
  );
}
