import { useMemo, type ReactNode } from 'react';
import type { BoardJob } from '@keybed/shared';
import { useSearchParams } from 'react-router-dom';
import { ErrorState } from '@/components/error-state';
import { todayKey } from '@/lib/format';
import { useLengthUnit } from '@/lib/length-unit';
import { useBoard } from '../api/get-board';
import { filtersFromSearch, hasFilters, withFilters } from '../lib/board-filters';
import { BoardSkeleton } from './board-skeleton';
import { NoJobs, NoStages } from './board-empty';
import { BoardToolbar } from './board-toolbar';
import { MovableBoard } from './movable-board';
import { StaticBoard } from './static-board';

interface BoardScreenProps {
  canRunBoard: boolean;
  /** What a card shows in its footer beside the technicians (hours and money indicators). */
  cardExtras?: (job: BoardJob) => ReactNode;
}

/** The live board: filters from the URL, one column per active stage, cards that move for runners. */
export function BoardScreen({ canRunBoard, cardExtras }: BoardScreenProps) {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => filtersFromSearch(params), [params]);
  const board = useBoard(filters);
  const unit = useLengthUnit();
  const today = todayKey();
  const isFiltered = hasFilters(filters);

  const data = board.data;
  const jobTotal = data?.stages.reduce((sum, s) => sum + s.jobCount, 0) ?? 0;
  const props = data ? { board: data, unit, today, isFiltered, cardExtras } : undefined;

  return (
    <>
      <BoardToolbar filters={filters} board={data} onChange={(changes) => setParams(withFilters(params, changes), { replace: true })} />
      {board.isPending ? (
        <BoardSkeleton />
      ) : board.isError && !data ? (
        <ErrorState error={board.error} onRetry={() => void board.refetch()} isRetrying={board.isFetching} />
      ) : data && data.stages.length === 0 ? (
        <NoStages canRunBoard={canRunBoard} />
      ) : (
        <>
          {jobTotal === 0 && !isFiltered && <NoJobs canRunBoard={canRunBoard} />}
          {board.isError && <ErrorState error={board.error} onRetry={() => void board.refetch()} isRetrying={board.isFetching} className="mb-4" />}
          <div
            aria-busy={board.isFetching && board.isPlaceholderData ? true : undefined}
            className="-mx-4 flex snap-x snap-proximity scroll-px-4 gap-3 overflow-x-auto px-4 pb-4 sm:-mx-6 sm:scroll-px-6 sm:px-6 lg:-mx-8 lg:scroll-px-8 lg:px-8"
          >
            {props && (canRunBoard ? <MovableBoard {...props} /> : <StaticBoard {...props} />)}
          </div>
        </>
      )}
    </>
  );
}
