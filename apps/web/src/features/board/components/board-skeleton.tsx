import { LoadingRegion, Skeleton } from '@/components/skeleton';

/** Column-shaped placeholders while the board loads. */
export function BoardSkeleton() {
  return (
    <LoadingRegion label="Loading the board">
      <div className="flex gap-3 overflow-hidden pb-4">
        {[3, 2, 4, 1, 2, 1].map((cards, column) => (
          <div key={column} className="w-[min(18rem,85vw)] shrink-0 space-y-2 rounded-lg border border-graphite-300 bg-graphite-100 p-2">
            <Skeleton className="h-9 w-2/3" />
            {Array.from({ length: cards }, (_, i) => (
              <Skeleton key={i} className="h-28 w-full" />
            ))}
          </div>
        ))}
      </div>
    </LoadingRegion>
  );
}
