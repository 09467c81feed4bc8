import { useState } from 'react';
import type { Invitation } from '@keybed/shared';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { formatDateTime } from '@/lib/format';
import { ROLE_LABELS } from '@/lib/roles';
import { showToast } from '@/lib/toast';
import { useRevokeInvitation } from '../api/revoke-invitation';

export function InvitationRow({ invitation }: { invitation: Invitation }) {
  const revoke = useRevokeInvitation();
  const [isConfirming, setIsConfirming] = useState(false);

  function confirmRevoke() {
    revoke.mutate(invitation.id, {
      onSuccess: () => showToast('success', `Invitation for ${invitation.email} revoked.`),
      onSettled: () => setIsConfirming(false),
    });
  }

  return (
    <li className="flex flex-wrap items-center justify-between gap-3 border-t border-graphite-300 px-4 py-3 first:border-t-0">
      <div className="min-w-0">
        <p className="font-semibold break-all">{invitation.email}</p>
        <p className="text-sm text-graphite-600">
          {ROLE_LABELS[invitation.role]} · expires <span className="tabular-figures">{formatDateTime(invitation.expiresAt)}</span>
        </p>
      </div>
      <Button variant="secondary" size="sm" onClick={() => setIsConfirming(true)}>
        Revoke<span className="sr-only"> invitation for {invitation.email}</span>
      </Button>
      <ConfirmDialog
        isOpen={isConfirming}
        title="Revoke this invitation?"
        confirmLabel="Revoke invitation"
        isPending={revoke.isPending}
        onConfirm={confirmRevoke}
        onCancel={() => setIsConfirming(false)}
      >
        <p>
          The link sent to <strong className="break-all">{invitation.email}</strong> stops working. You can invite them
          again later.
        </p>
      </ConfirmDialog>
    </li>
  );
}
