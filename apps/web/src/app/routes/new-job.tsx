import { useState, type ReactNode } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import type { Job } from '@keybed/shared';
import { Button } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { ClientPicker } from '@/features/clients/components/client-picker';
import { NewJobForm } from '@/features/jobs/components/new-job-form';
import { usePiano } from '@/features/pianos/api/get-piano';
import { PianoPicker } from '@/features/pianos/components/piano-picker';
import { useStages } from '@/features/stages/api/get-stages';
import { pianoName } from '@/lib/piano';
import { showToast } from '@/lib/toast';
import { RunnersOnly } from '../layout/runners-only';

interface Chosen {
  id: string;
  name: string;
}

function Step({ number, title, chosen, onChange, children }: { number: number; title: string; chosen?: string | undefined; onChange?: () => void; children?: ReactNode }) {
  return (
    <section aria-labelledby={`step-${number}`} className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`step-${number}`} className="text-lg font-semibold">
          {number}. {title}
          {chosen && <span className="font-normal">: {chosen}</span>}
        </h2>
        {chosen && onChange && (
          <Button size="sm" variant="quiet" onClick={onChange}>
            Change<span className="sr-only"> the {title.toLowerCase()}</span>
          </Button>
        )}
      </div>
      {!chosen && children}
    </section>
  );
}

/** Client → piano → the job itself; client and piano can be added on the way. */
function NewJobSteps({ initialClient, initialPiano, stageId }: { initialClient: Chosen | null; initialPiano: Chosen | null; stageId?: string | undefined }) {
  const navigate = useNavigate();
  const stages = useStages();
  const [client, setClient] = useState(initialClient);
  const [piano, setPiano] = useState(initialPiano);
  const activeStages = (stages.data ?? []).filter((s) => !s.isArchived).sort((a, b) => a.position - b.position);

  function created(job: Job) {
    const stage = activeStages.find((s) => s.id === job.stageId);
    showToast('success', `Started ${job.title}${stage ? ` in ${stage.name}` : ''}.`);
    void navigate(paths.board.build());
  }

  return (
    <div className="max-w-3xl space-y-4">
      <Step number={1} title="Client" chosen={client?.name} onChange={() => { setClient(null); setPiano(null); }}>
        <ClientPicker selectedId={null} onSelect={(c) => setClient({ id: c.id, name: c.name })} />
      </Step>
      {client && (
        <Step number={2} title="Piano" chosen={piano?.name} onChange={() => setPiano(null)}>
          <PianoPicker clientId={client.id} clientName={client.name} selectedId={null} onSelect={(p) => setPiano({ id: p.id, name: pianoName(p) })} />
        </Step>
      )}
      {client && piano && (
        <Step number={3} title="The job">
          {stages.isPending ? (
            <Skeleton className="h-64 w-full" />
          ) : stages.isError ? (
            <ErrorState error={stages.error} onRetry={() => void stages.refetch()} headingLevel="h3" />
          ) : (
            <NewJobForm pianoId={piano.id} stages={activeStages} defaultStageId={stageId} onCreated={created} />
          )}
        </Step>
      )}
    </div>
  );
}

/** Starting from a piano's page: the client and piano are known already. */
function FromPiano({ pianoId, stageId }: { pianoId: string; stageId?: string | undefined }) {
  const piano = usePiano(pianoId);
  if (piano.isPending) return <Skeleton className="h-64 w-full max-w-3xl" />;
  if (piano.isError) return <ErrorState error={piano.error} onRetry={() => void piano.refetch()} />;
  const { data } = piano;
  return (
    <NewJobSteps
      initialClient={{ id: data.clientId, name: data.clientName }}
      initialPiano={{ id: data.id, name: pianoName(data) }}
      stageId={stageId}
    />
  );
}

export function Component() {
  const me = useSignedInMember();
  const [params] = useSearchParams();
  const pianoId = params.get('pianoId');
  const stageId = params.get('stageId') ?? undefined;
  return (
    <>
      <title>{`New job · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="New job" description="Choose the client and their piano, then say what the job is." />
      <RunnersOnly role={me.role} what="start jobs">
        {pianoId ? <FromPiano pianoId={pianoId} stageId={stageId} /> : <NewJobSteps initialClient={null} initialPiano={null} stageId={stageId} />}
      </RunnersOnly>
    </>
  );
}
