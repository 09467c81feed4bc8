import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { cautionsForStage } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { RegionBoundary } from '@/components/region-boundary';
import { SafetyCautions } from '@/components/safety-caution';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useRunning } from '@/features/bench/api/get-running';
import { useTechnicians } from '@/features/bench/api/get-technicians';
import { jobQueryOptions, useJob } from '@/features/jobs/api/get-job';
import { JobEditForm } from '@/features/jobs/components/job-edit-form';
import { JobFacts } from '@/features/jobs/components/job-facts';
import { JobOverview } from '@/features/jobs/components/job-overview';
import { StageHistory } from '@/features/jobs/components/stage-history';
import { STATUS_LABELS } from '@/features/jobs/lib/job-labels';
import { useStages } from '@/features/stages/api/get-stages';
import { jobTasksQueryOptions } from '@/features/tasks/api/get-job-tasks';
import { JobTasks } from '@/features/tasks/components/job-tasks';
import { canRunBoard } from '@/lib/roles';
import { CostingSection, EstimateSection, PartsUsedSection } from './job-estimate-and-costing';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) {
      void queryClient.prefetchQuery(jobQueryOptions(params.id));
      void queryClient.prefetchQuery(jobTasksQueryOptions(params.id));
    }
    return null;
  };

/** The tasks section, with the stages, people and running timers it needs from other features. */
function TasksSection({ jobId, currentStage }: { jobId: string; currentStage: { id: string; name: string } | undefined }) {
  const me = useSignedInMember();
  const canEdit = canRunBoard(me.role);
  const stages = useStages();
  const people = useTechnicians();
  const running = useRunning();
  return (
    <JobTasks
      jobId={jobId}
      currentStage={currentStage}
      canEdit={canEdit}
      userId={me.user.id}
      stages={(stages.data ?? []).filter((s) => !s.isArchived)}
      people={people.data ?? []}
      running={(running.data ?? []).filter((r) => r.job.id === jobId)}
    />
  );
}

function JobSkeleton() {
  return (
    <LoadingRegion label="Loading the job">
      <Skeleton className="h-9 w-80 max-w-full" />
      <div className="mt-6 grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Skeleton className="h-96 w-full" />
        <Skeleton className="h-64 w-full" />
      </div>
    </LoadingRegion>
  );
}

export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const job = useJob(id);
  const back = <ButtonLink to={paths.board.build()} variant="secondary">Back to the board</ButtonLink>;

  if (job.isPending) return <JobSkeleton />;
  if (job.isError) {
    return (
      <>
        <title>Job · Keybed</title>
        <PageHeader title="Job" actions={back} />
        <ErrorState error={job.error} onRetry={() => void job.refetch()} isRetrying={job.isFetching} />
      </>
    );
  }

  const data = job.data;
  const stageName = data.history.at(-1)?.toStage.name;
  const isOnBoard = data.status === 'active' || data.status === 'on_hold';
  return (
    <>
      <title>{`${data.title} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={data.title}
        description={`${STATUS_LABELS[data.status]}${isOnBoard && stageName ? ` · in ${stageName}` : ''} · ${data.client.name}`}
        actions={back}
      />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-8">
          {/* A job in a delivery or collection stage is about to be moved: say so before anything else. */}
          {isOnBoard && <SafetyCautions variant="panel" cautions={cautionsForStage(stageName)} />}
          <section aria-labelledby="job-tasks-heading" className="space-y-3">
            <h2 id="job-tasks-heading" className="text-lg font-semibold">Tasks</h2>
            <RegionBoundary>
              <TasksSection jobId={data.id} currentStage={isOnBoard ? data.history.at(-1)?.toStage : undefined} />
            </RegionBoundary>
          </section>
          <section aria-labelledby="job-estimate-heading" className="space-y-3">
            <h2 id="job-estimate-heading" className="text-lg font-semibold">Estimate</h2>
            <RegionBoundary>
              <EstimateSection job={data} />
            </RegionBoundary>
          </section>
          <section aria-labelledby="job-parts-heading" className="space-y-3">
            <h2 id="job-parts-heading" className="text-lg font-semibold">Parts used</h2>
            <RegionBoundary>
              <PartsUsedSection job={data} />
            </RegionBoundary>
          </section>
          <section aria-labelledby="job-costing-heading" className="space-y-3">
            <h2 id="job-costing-heading" className="text-lg font-semibold">Costing</h2>
            <RegionBoundary>
              <CostingSection job={data} />
            </RegionBoundary>
          </section>
          <section aria-labelledby="job-details-heading" className="space-y-3">
            <h2 id="job-details-heading" className="text-lg font-semibold">{canRunBoard(me.role) ? 'Edit the job' : 'Details'}</h2>
            <RegionBoundary>{canRunBoard(me.role) ? <JobEditForm job={data} /> : <JobOverview job={data} />}</RegionBoundary>
          </section>
          <section aria-labelledby="job-history-heading" className="space-y-3">
            <h2 id="job-history-heading" className="text-lg font-semibold">Stage history</h2>
            <RegionBoundary>
              <StageHistory history={data.history} />
            </RegionBoundary>
          </section>
        </div>
        <RegionBoundary>
          <JobFacts job={data} />
        </RegionBoundary>
      </div>
    </>
  );
}
