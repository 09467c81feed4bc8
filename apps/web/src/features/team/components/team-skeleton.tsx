import { LoadingRegion, Skeleton } from '@/components/skeleton';

/** Placeholder rows with the shape of the members table or invitations list. */
export function TeamSkeleton({ rows = 3, label }: { rows?: number; label: string }) {
  return (
    <LoadingRegion label={label}>
      <div className="space-y-2 rounded-lg border border-graphite-300 bg-white p-4">
        {Array.from({ length: rows }, (_, index) => (
          <div key={index} className="flex items-center gap-4">
            <div className="flex-1 space-y-1.5">
              <Skeleton className="h-4 w-40" />
              <Skeleton className="h-3 w-56 max-w-full" />
            </div>
            <Skeleton className="hidden h-8 w-32 sm:block" />
            <Skeleton className="h-8 w-24" />
          </div>
        ))}
      </div>
    </LoadingRegion>
  );
}
