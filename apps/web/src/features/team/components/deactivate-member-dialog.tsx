import type { Member } from '@keybed/shared';
import { ConfirmDialog } from '@/components/confirm-dialog';

interface DeactivateMemberDialogProps {
  member: Member;
  isOpen: boolean;
  isPending: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}

export function DeactivateMemberDialog({ member, ...rest }: DeactivateMemberDialogProps) {
  return (
    <ConfirmDialog title={`Deactivate ${member.name}?`} confirmLabel={`Deactivate ${member.name}`} {...rest}>
      <p>
        They are signed out on every device straight away and cannot sign in again until you reactivate them.
      </p>
      <p>Their work, time records and notes stay in the workshop.</p>
    </ConfirmDialog>
  );
}
