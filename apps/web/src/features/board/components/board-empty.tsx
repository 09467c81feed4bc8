import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';

/** The board has no active stage: nothing can be shown until one exists. */
export function NoStages({ canRunBoard }: { canRunBoard: boolean }) {
  return (
    <EmptyState
      title="The board has no stages"
      action={canRunBoard ? <ButtonLink to={paths.stagesSettings.build()}>Set up stages</ButtonLink> : undefined}
    >
      <p>
        Stages are the steps a piano goes through in your workshop, from intake to delivery.
        {canRunBoard ? ' Add or restore at least one to start.' : ' Ask the owner or foreman to set them up.'}
      </p>
    </EmptyState>
  );
}

/** Stages exist, but no job does yet. */
export function NoJobs({ canRunBoard }: { canRunBoard: boolean }) {
  return (
    <EmptyState
      title="No jobs on the board yet"
      headingLevel="h2"
      className="mb-4"
      action={
        canRunBoard ? (
          <div className="flex flex-wrap justify-center gap-2">
            <ButtonLink to={paths.newJob.build()}>Start a job</ButtonLink>
            <ButtonLink to={paths.newClient.build()} variant="secondary">
              Add a client
            </ButtonLink>
          </div>
        ) : undefined
      }
    >
      <p>
        {canRunBoard
          ? 'Add a client and a piano, then start a job: it appears here in its first stage.'
          : 'Jobs appear here once the owner or foreman starts them.'}
      </p>
    </EmptyState>
  );
}
