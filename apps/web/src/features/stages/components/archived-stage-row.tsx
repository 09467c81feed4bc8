import type { Stage } from '@keybed/shared';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { showToast } from '@/lib/toast';
import { useUpdateStage } from '../api/update-stage';

/** An archived stage: off the board, kept for history, back at the end of the board on restore. */
export function ArchivedStageRow({ stage }: { stage: Stage }) {
  const update = useUpdateStage();
  return (
    <li className="rounded-lg border border-graphite-300 bg-graphite-100 p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-semibold">{stage.name}</span>
        <Button
          size="sm"
          variant="secondary"
          isPending={update.isPending}
          onClick={() =>
            update.mutate(
              { stageId: stage.id, changes: { isArchived: false } },
              { onSuccess: (saved) => showToast('success', `${saved.name} is back on the board, at the end.`) },
            )
          }
        >
          Restore<span className="sr-only"> {stage.name}</span>
        </Button>
      </div>
      {update.isError && (
        <div className="mt-3">
          <FormError error={update.error} />
        </div>
      )}
    </li>
  );
}
