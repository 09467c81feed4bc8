import type { Stage } from '@keybed/shared';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { useReorderStages } from '../api/reorder-stages';
import { useStages } from '../api/get-stages';
import { AddStageForm } from './add-stage-form';
import { ArchivedStageRow } from './archived-stage-row';
import { StageRow } from './stage-row';

const byPosition = (a: Stage, b: Stage) => a.position - b.position;

/** Stage list for owners and foremen: the board's columns, in order, and the archived ones. */
export function StagesSettings() {
  const stages = useStages();
  const reorder = useReorderStages();

  if (stages.isPending) {
    return (
      <LoadingRegion label="Loading stages">
        <div className="space-y-3">
          {[0, 1, 2, 3].map((i) => <Skeleton key={i} className="h-20 w-full" />)}
        </div>
      </LoadingRegion>
    );
  }
  if (stages.isError) return <ErrorState error={stages.error} onRetry={() => void stages.refetch()} isRetrying={stages.isFetching} />;

  const active = stages.data.filter((s) => !s.isArchived).sort(byPosition);
  const archived = stages.data.filter((s) => s.isArchived).sort((a, b) => a.name.localeCompare(b.name));

  function move(stageId: string, by: -1 | 1) {
    const ids = active.map((s) => s.id);
    const from = ids.indexOf(stageId);
    const to = from + by;
    if (from === -1 || to < 0 || to >= ids.length) return;
    [ids[from], ids[to]] = [ids[to]!, ids[from]!];
    reorder.mutate(ids);
  }

  return (
    <div className="space-y-10">
      <section aria-labelledby="active-stages-heading" className="space-y-3">
        <h2 id="active-stages-heading" className="text-lg font-semibold">On the board, in order</h2>
        <ol aria-label="Active stages" className="space-y-2">
          {active.map((stage, index) => (
            <StageRow
              key={stage.id}
              stage={stage}
              place={index + 1}
              count={active.length}
              onMove={move}
              isReordering={reorder.isPending}
            />
          ))}
        </ol>
      </section>
      <section aria-labelledby="add-stage-heading" className="space-y-3">
        <h2 id="add-stage-heading" className="text-lg font-semibold">Add a stage</h2>
        <AddStageForm />
      </section>
      <section aria-labelledby="archived-stages-heading" className="space-y-3">
        <h2 id="archived-stages-heading" className="text-lg font-semibold">Archived</h2>
        {archived.length === 0 ? (
          <p className="text-graphite-600">No archived stages. Archive a stage once it is empty and no longer used; its history is kept.</p>
        ) : (
          <ul aria-label="Archived stages" className="space-y-2">
            {archived.map((stage) => <ArchivedStageRow key={stage.id} stage={stage} />)}
          </ul>
        )}
      </section>
    </div>
  );
}
