import { useState } from 'react';
import type { WallDevice } from '@keybed/shared';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { formatDateTime } from '@/lib/format';
import { showToast } from '@/lib/toast';
import { useWallDevices } from '../api/get-wall-devices';
import { useRevokeWallDevice } from '../api/revoke-wall-device';

function DeviceRow({ device, onUnpair }: { device: WallDevice; onUnpair: () => void }) {
  const isRevoked = device.revokedAt !== null;
  return (
    <li className="flex flex-wrap items-center gap-x-6 gap-y-2 border-t border-graphite-200 px-4 py-3 first:border-t-0">
      <div className="min-w-0 flex-1">
        <p className="font-semibold">{device.name}</p>
        <p className="text-sm text-graphite-600">
          Paired {formatDateTime(device.createdAt)}
          {device.pairedBy && ` by ${device.pairedBy.name}`} ·{' '}
          {isRevoked ? `unpaired ${formatDateTime(device.revokedAt!)}` : device.lastSeenAt ? `last seen ${formatDateTime(device.lastSeenAt)}` : 'not seen yet'}
        </p>
      </div>
      {isRevoked ? (
        <span className="rounded bg-graphite-200 px-2 py-0.5 text-sm font-semibold">Unpaired</span>
      ) : (
        <Button size="sm" variant="secondary" onClick={onUnpair}>
          Unpair<span className="sr-only"> {device.name}</span>
        </Button>
      )}
    </li>
  );
}

/** Every screen ever paired, active ones first; unpairing one stops it at once. */
export function WallDevices() {
  const devices = useWallDevices();
  const revoke = useRevokeWallDevice();
  const [confirming, setConfirming] = useState<WallDevice | null>(null);

  if (devices.isPending) {
    return (
      <LoadingRegion label="Loading paired screens">
        <Skeleton className="h-32 w-full" />
      </LoadingRegion>
    );
  }
  if (devices.isError) return <ErrorState error={devices.error} headingLevel="h3" onRetry={() => void devices.refetch()} isRetrying={devices.isFetching} />;
  if (devices.data.length === 0) {
    return (
      <EmptyState title="No screen paired yet" headingLevel="h3">
        <p>On the browser of the workshop’s touch screen, sign in and choose Pair this browser.</p>
      </EmptyState>
    );
  }
  return (
    <>
      <ul aria-label="Paired screens" className="rounded-lg border border-graphite-300 bg-white">
        {devices.data.map((device) => (
          <DeviceRow key={device.id} device={device} onUnpair={() => setConfirming(device)} />
        ))}
      </ul>
      <ConfirmDialog
        isOpen={confirming !== null}
        title={`Unpair ${confirming?.name ?? 'this screen'}?`}
        confirmLabel={`Unpair ${confirming?.name ?? 'the screen'}`}
        isPending={revoke.isPending}
        onCancel={() => setConfirming(null)}
        onConfirm={() =>
          confirming &&
          revoke.mutate(confirming.id, {
            onSuccess: () => showToast('success', `${confirming.name} is unpaired.`),
            onSettled: () => setConfirming(null),
          })
        }
      >
        <p>It stops showing who is working and can no longer clock anyone on or off. Clock actions still waiting on it are not sent.</p>
        <p>To use it again, an owner or foreman pairs it afresh.</p>
      </ConfirmDialog>
    </>
  );
}
