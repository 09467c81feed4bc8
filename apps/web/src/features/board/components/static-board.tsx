import type { ReactNode } from 'react';
import type { Board, BoardJob } from '@keybed/shared';
import { RegionBoundary } from '@/components/region-boundary';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { JobCard } from './job-card';
import { StageColumn } from './stage-column';

interface StaticBoardProps {
  board: Board;
  unit: PreferredLengthUnit;
  today: string;
  isFiltered: boolean;
  cardExtras?: ((job: BoardJob) => ReactNode) | undefined;
}

/** The board to read (technicians): the same columns and cards, nothing to drag. */
export function StaticBoard({ board, unit, today, isFiltered, cardExtras }: StaticBoardProps) {
  return (
    <>
      {board.stages.map((stage) => (
        <RegionBoundary key={stage.id} className="w-72 shrink-0">
          <StageColumn stage={stage} cardCount={stage.jobs.length} isFiltered={isFiltered}>
            {stage.jobs.map((job) => (
              <li key={job.id}>
                <JobCard job={job} unit={unit} today={today} footerExtras={cardExtras?.(job)} />
              </li>
            ))}
          </StageColumn>
        </RegionBoundary>
      ))}
    </>
  );
}
