import { useState } from 'react';
import type { BenchTechnician } from '@keybed/shared';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { ROLE_LABELS } from '@/lib/roles';
import { showToast } from '@/lib/toast';
import { useTechnicians } from '../api/get-technicians';
import { useUnlockPin } from '../api/unlock-pin';
import { MemberPinForm } from './member-pin-form';

const timeFormat = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

function PinState({ member, now }: { member: BenchTechnician; now: number }) {
  if (member.lockedUntil && Date.parse(member.lockedUntil) > now) {
    return <span className="font-semibold text-damper">Locked until {timeFormat.format(new Date(member.lockedUntil))}</span>;
  }
  return member.hasPin ? <span>PIN set</span> : <span className="text-graphite-600">No PIN yet</span>;
}

function PinRow({ member, canSetPins }: { member: BenchTechnician; canSetPins: boolean }) {
  const unlock = useUnlockPin();
  const [isSetting, setIsSetting] = useState(false);
  const isLocked = member.lockedUntil !== null && Date.parse(member.lockedUntil) > Date.now();
  return (
    <li className="space-y-3 border-t border-graphite-200 py-3 first:border-t-0">
      <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
        <div className="min-w-48 flex-1">
          <p className="font-semibold">{member.name}</p>
          <p className="text-sm text-graphite-600">{ROLE_LABELS[member.role]}</p>
        </div>
        <p className="min-w-40">
          <PinState member={member} now={Date.now()} />
        </p>
        <div className="flex flex-wrap gap-2">
          {isLocked && (
            <Button
              size="sm"
              isPending={unlock.isPending}
              onClick={() => unlock.mutate(member.membershipId, { onSuccess: () => showToast('success', `${member.name} can use their PIN again.`) })}
            >
              Unlock {member.name}
            </Button>
          )}
          {canSetPins && !isSetting && (
            <Button size="sm" variant="secondary" onClick={() => setIsSetting(true)}>
              Set PIN<span className="sr-only"> for {member.name}</span>
            </Button>
          )}
        </div>
      </div>
      {isSetting && <MemberPinForm member={member} onDone={() => setIsSetting(false)} />}
    </li>
  );
}

/** Everyone who may clock on at the wall, their PIN state, and unlocking (and, for the owner, setting) PINs. */
export function TechnicianPins({ canSetPins }: { canSetPins: boolean }) {
  const technicians = useTechnicians();
  if (technicians.isPending) {
    return (
      <LoadingRegion label="Loading PINs">
        <Skeleton className="h-40 w-full" />
      </LoadingRegion>
    );
  }
  if (technicians.isError) return <ErrorState error={technicians.error} headingLevel="h3" onRetry={() => void technicians.refetch()} isRetrying={technicians.isFetching} />;
  if (technicians.data.length === 0) return <EmptyState title="No members yet" headingLevel="h3" />;
  return (
    <ul aria-label="Wall-screen PINs" className="rounded-lg border border-graphite-300 bg-white px-4">
      {technicians.data.map((member) => (
        <PinRow key={member.id} member={member} canSetPins={canSetPins} />
      ))}
    </ul>
  );
}
