import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useOwnPin } from '@/features/bench/api/get-own-pin';
import { OwnPinForm } from '@/features/bench/components/own-pin-form';
import { ROLE_LABELS } from '@/lib/roles';

const timeFormat = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

function PinSection() {
  const pin = useOwnPin();
  if (pin.isPending) {
    return (
      <LoadingRegion label="Loading your PIN">
        <Skeleton className="h-48 w-full" />
      </LoadingRegion>
    );
  }
  if (pin.isError) return <ErrorState error={pin.error} headingLevel="h3" onRetry={() => void pin.refetch()} isRetrying={pin.isFetching} />;
  const { hasPin, lockedUntil } = pin.data;
  return (
    <div className="space-y-4">
      <p className="max-w-prose text-graphite-700">
        {hasPin
          ? 'You have a PIN. Change it here if someone may have seen it.'
          : 'You have no PIN yet. Set one to clock on and off at the workshop’s wall screen.'}
        {lockedUntil && (
          <strong className="mt-1 block text-damper">
            Your PIN is locked until {timeFormat.format(new Date(lockedUntil))} after wrong tries. Setting a new PIN unlocks it.
          </strong>
        )}
      </p>
      <OwnPinForm hasPin={hasPin} />
    </div>
  );
}

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Your profile · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Your profile" description={`${me.user.name} · ${me.user.email} · ${ROLE_LABELS[me.role]} at ${me.workshop.name}`} />
      <section aria-labelledby="pin-heading" className="max-w-2xl space-y-3 rounded-lg border border-graphite-300 bg-white px-6 py-6">
        <h2 id="pin-heading" className="text-lg font-semibold">Wall-screen PIN</h2>
        <PinSection />
      </section>
    </>
  );
}
