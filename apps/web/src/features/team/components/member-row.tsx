import { useState } from 'react';
import type { Member, Role } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { formatDate } from '@/lib/format';
import { ROLE_LABELS, ROLE_OPTIONS } from '@/lib/roles';
import { showToast } from '@/lib/toast';
import { useUpdateMember } from '../api/update-member';
import { DeactivateMemberDialog } from './deactivate-member-dialog';
import { MemberStatus } from './member-status';

interface MemberRowProps {
  member: Member;
  isYou: boolean;
  onUpdated?: (member: Member) => void;
}

const cellLabel = 'block text-sm text-graphite-600 md:hidden';

export function MemberRow({ member, isYou, onUpdated }: MemberRowProps) {
  const update = useUpdateMember();
  const [isConfirming, setIsConfirming] = useState(false);

  function changeRole(role: Role) {
    update.mutate(
      { memberId: member.id, changes: { role } },
      {
        onSuccess: (saved) => {
          showToast('success', `${saved.name} is now ${ROLE_LABELS[saved.role].toLowerCase()}.`);
          onUpdated?.(saved);
        },
      },
    );
  }

  function setActive(isActive: boolean) {
    update.mutate(
      { memberId: member.id, changes: { isActive } },
      {
        onSuccess: (saved) => {
          setIsConfirming(false);
          showToast('success', isActive ? `${saved.name} can sign in again.` : `${saved.name} is deactivated and signed out.`);
          onUpdated?.(saved);
        },
        onError: () => setIsConfirming(false),
      },
    );
  }

  return (
    <tr className="grid grid-cols-2 gap-3 rounded-lg border border-graphite-300 bg-white p-4 md:table-row md:rounded-none md:border-0 md:border-t md:p-0">
      <td className="col-span-2 md:py-3 md:pr-4 md:pl-4">
        <span className="font-semibold">{member.name}</span>
        {isYou && <span className="ml-2 rounded bg-spruce-light px-1.5 py-0.5 text-sm">You</span>}
        <span className="block break-all text-graphite-600">{member.email}</span>
      </td>
      <td className="md:py-3 md:pr-4">
        <span className={cellLabel} aria-hidden="true">
          Role
        </span>
        <Field label={`Role for ${member.name}`} isLabelHidden>
          {(control) => (
            <Select
              {...control}
              isCompact
              options={ROLE_OPTIONS}
              value={member.role}
              disabled={update.isPending}
              onChange={(event) => changeRole(event.target.value as Role)}
              className="md:w-40"
            />
          )}
        </Field>
      </td>
      <td className="md:py-3 md:pr-4">
        <span className={cellLabel}>Status</span>
        <MemberStatus isActive={member.isActive} />
      </td>
      <td className="md:py-3 md:pr-4">
        <span className={cellLabel}>Joined</span>
        <span className="tabular-figures">{formatDate(member.joinedAt)}</span>
      </td>
      <td className="md:py-3 md:pr-4 md:text-right">
        {isYou ? null : member.isActive ? (
          <Button variant="secondary" size="sm" onClick={() => setIsConfirming(true)} disabled={update.isPending}>
            Deactivate<span className="sr-only"> {member.name}</span>
          </Button>
        ) : (
          <Button variant="secondary" size="sm" onClick={() => setActive(true)} isPending={update.isPending}>
            Reactivate<span className="sr-only"> {member.name}</span>
          </Button>
        )}
        <DeactivateMemberDialog
          member={member}
          isOpen={isConfirming}
          isPending={update.isPending}
          onConfirm={() => setActive(false)}
          onCancel={() => setIsConfirming(false)}
        />
      </td>
    </tr>
  );
}
