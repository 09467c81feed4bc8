import type { ClientDetail } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { useLengthUnit } from '@/lib/length-unit';
import { pianoName, pianoShape } from '@/lib/piano';

interface ClientPianosProps {
  client: ClientDetail;
  canEdit: boolean;
}

/** The client's pianos, each linking to its page and job history. */
export function ClientPianos({ client, canEdit }: ClientPianosProps) {
  const unit = useLengthUnit();
  const addPiano = canEdit ? (
    <ButtonLink to={paths.newPiano.build({ clientId: client.id })} variant="secondary" size="sm">
      Add a piano
    </ButtonLink>
  ) : undefined;

  if (client.pianos.length === 0) {
    return (
      <EmptyState title="No pianos recorded" headingLevel="h3" action={addPiano}>
        <p>Add {client.name}’s piano to start a job on it.</p>
      </EmptyState>
    );
  }
  return (
    <div className="space-y-3">
      <ul aria-label={`Pianos of ${client.name}`} className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
        {client.pianos.map((piano) => (
          <li key={piano.id} className="px-4 py-3">
            <TextLink to={paths.piano.build(piano.id)}>{pianoName(piano)}</TextLink>
            <p className="text-sm text-graphite-600">
              {pianoShape(piano, unit)}
              {piano.yearApprox ? `, c. ${piano.yearApprox}` : ''}
              {piano.serialNumber ? ` · serial ${piano.serialNumber}` : ''}
            </p>
          </li>
        ))}
      </ul>
      {addPiano}
    </div>
  );
}
