import { LoadingRegion, Skeleton } from '@/components/skeleton';

/** Shown while the first page of the app loads: the shape of the header and a page. */
export function PageSkeleton() {
  return (
    <LoadingRegion label="Loading Keybed">
      <div className="h-16 bg-ink" />
      <div className="mx-auto max-w-7xl space-y-4 px-4 py-8 sm:px-6 lg:px-8">
        <Skeleton className="h-9 w-64 max-w-full" />
        <Skeleton className="h-5 w-96 max-w-full" />
        <Skeleton className="mt-6 h-48 w-full" />
      </div>
    </LoadingRegion>
  );
}
