import type { QueryClient } from '@tanstack/react-query';
import { ErrorState } from '@/components/error-state';
import { Field } from '@/components/field';
import { PageHeader } from '@/components/page-header';
import { Select } from '@/components/select';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { techniciansQueryOptions, useTechnicians } from '@/features/bench/api/get-technicians';
import { useJobTasks } from '@/features/tasks/api/get-job-tasks';
import type { TaskFieldProps } from '@/features/timesheets/components/correction-form';
import { TimesheetScreen } from '@/features/timesheets/components/timesheet-screen';
import { canSuperviseBench } from '@/lib/roles';

export const clientLoader = (queryClient: QueryClient) => () => {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  if (me && canSuperviseBench(me.role)) void queryClient.prefetchQuery(techniciansQueryOptions());
  return null;
};

/** A correction may move an entry to another task of the same job. */
function TaskField({ jobId, value, onChange, error }: TaskFieldProps) {
  const tasks = useJobTasks(jobId);
  const options = (tasks.data ?? []).map((t) => ({ value: t.id, label: `${t.title}${t.status === 'done' ? ' (done)' : ''}` }));
  if (!options.some((o) => o.value === value)) options.unshift({ value, label: 'The current task' });
  return (
    <Field label="Task" error={error} className="max-w-md">
      {(control) => <Select {...control} options={options} value={value} disabled={tasks.isPending} onChange={(e) => onChange(e.target.value)} />}
    </Field>
  );
}

function SupervisorTimesheets({ role }: { role: Parameters<typeof canSuperviseBench>[0] }) {
  const technicians = useTechnicians();
  if (technicians.isPending) {
    return (
      <LoadingRegion label="Loading technicians">
        <Skeleton className="h-64 w-full" />
      </LoadingRegion>
    );
  }
  if (technicians.isError) return <ErrorState error={technicians.error} onRetry={() => void technicians.refetch()} isRetrying={technicians.isFetching} />;
  return <TimesheetScreen role={role} technicians={technicians.data} renderTaskField={(props) => <TaskField {...props} />} />;
}

export function Component() {
  const me = useSignedInMember();
  const isSupervisor = canSuperviseBench(me.role);
  return (
    <>
      <title>{`Timesheets · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Timesheets"
        description={isSupervisor ? 'Each technician’s week: check it, correct entries with a reason, approve it, download it.' : 'Your week at the bench, day by day and job by job.'}
      />
      {isSupervisor ? (
        <SupervisorTimesheets role={me.role} />
      ) : (
        <TimesheetScreen role={me.role} technicians={undefined} renderTaskField={(props) => <TaskField {...props} />} />
      )}
    </>
  );
}
