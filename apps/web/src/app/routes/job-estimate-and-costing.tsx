import { useQueryClient } from '@tanstack/react-query';
import type { JobDetail, Role } from '@keybed/shared';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { costingKeys } from '@/features/costing/api/keys';
import { JobCosting } from '@/features/costing/components/job-costing';
import { JobEstimates } from '@/features/estimates/components/job-estimates';
import { useParts } from '@/features/parts/api/get-parts';
import { LogPartsUsed } from '@/features/parts/components/log-parts-used';
import { JobPayments } from '@/features/payments/components/job-payments';
import { useWorkshopSettings } from '@/features/settings/api/get-settings';
import { useJobTasks } from '@/features/tasks/api/get-job-tasks';
import { canRunBoard, canSeeCosts } from '@/lib/roles';

/**
 * The job page's money sections, composed from the estimates, parts, costing, settings and tasks
 * features: each reads only what the member's role is sent.
 */

export function EstimateSection({ job }: { job: JobDetail }) {
  const me = useSignedInMember();
  const canEdit = canRunBoard(me.role);
  const settings = useWorkshopSettings();
  const tasks = useJobTasks(job.id);
  const parts = useParts({});
  return (
    <JobEstimates
      jobId={job.id}
      canEdit={canEdit}
      isClosed={job.status === 'cancelled'}
      canSeeCosts={canSeeCosts(me.role)}
      labourRateMinorPerHour={settings.data?.labourRateMinorPerHour}
      tasks={tasks.data ?? []}
      parts={(parts.data?.parts ?? []).filter((p) => p.isActive)}
    />
  );
}

/** Technicians log parts on their own tasks; the owner and foreman on any, and correct with a reason. */
function tasksFor(role: Role, userId: string, tasks: ReadonlyArray<{ id: string; title: string; assignees: ReadonlyArray<{ id: string }> }>) {
  return canRunBoard(role) ? tasks : tasks.filter((t) => t.assignees.some((a) => a.id === userId));
}

export function PartsUsedSection({ job }: { job: JobDetail }) {
  const me = useSignedInMember();
  const queryClient = useQueryClient();
  const tasks = useJobTasks(job.id);
  const parts = useParts({});
  if (job.status === 'cancelled') return <p className="text-graphite-600">This job was cancelled: no more parts are logged on it.</p>;
  if (tasks.isPending || parts.isPending) return <p className="text-graphite-600">Loading tasks and parts…</p>;
  const mine = tasksFor(me.role, me.user.id, tasks.data ?? []);
  if (mine.length === 0 && !canRunBoard(me.role)) return <p className="text-graphite-600">None of this job’s tasks is assigned to you, so there is nothing for you to log parts against.</p>;
  return (
    <LogPartsUsed
      tasks={mine}
      parts={(parts.data?.parts ?? []).filter((p) => p.isActive)}
      canCorrect={canRunBoard(me.role)}
      onRecorded={() => void queryClient.invalidateQueries({ queryKey: costingKeys.job(job.id) })}
    />
  );
}

/** The job's costing for every member; the payments the client made, for the owner. */
export function CostingSection({ job }: { job: JobDetail }) {
  const me = useSignedInMember();
  return (
    <div className="space-y-5">
      <JobCosting jobId={job.id} />
      {canSeeCosts(me.role) && (
        <section aria-labelledby="job-payments-heading" className="space-y-2">
          <h3 id="job-payments-heading" className="font-semibold">Payments from the client</h3>
          <JobPayments jobId={job.id} />
        </section>
      )}
    </div>
  );
}
