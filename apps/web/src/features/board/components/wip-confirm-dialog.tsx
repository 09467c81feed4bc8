import { ConfirmDialog } from '@/components/confirm-dialog';

export interface HeldMove {
  jobTitle: string;
  fromStageName: string;
  toStageName: string;
  jobCount: number;
  wipLimit: number;
}

interface WipConfirmDialogProps {
  held: HeldMove | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Moving into a stage at or over its WIP limit is allowed, after saying so. */
export function WipConfirmDialog({ held, onConfirm, onCancel }: WipConfirmDialogProps) {
  const isOver = held !== null && held.jobCount > held.wipLimit;
  return (
    <ConfirmDialog
      isOpen={held !== null}
      title={held ? `${held.toStageName} is ${isOver ? 'over' : 'at'} its WIP limit` : ''}
      confirmLabel={held ? `Move to ${held.toStageName}` : 'Move'}
      cancelLabel={held ? `Keep in ${held.fromStageName}` : 'Cancel'}
      isDestructive={false}
      onConfirm={onConfirm}
      onCancel={onCancel}
    >
      {held && (
        <p>
          {held.toStageName} already holds {held.jobCount} {held.jobCount === 1 ? 'job' : 'jobs'} and its WIP limit is {held.wipLimit}. Move{' '}
          <strong className="text-ink">{held.jobTitle}</strong> there anyway?
        </p>
      )}
    </ConfirmDialog>
  );
}
