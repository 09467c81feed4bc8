import type { ReactNode, Ref } from 'react';
import type { Board } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { wipState } from '../lib/wip';
import { StageHeader } from './stage-header';

interface StageColumnProps {
  stage: Board['stages'][number];
  /** Cards, each an <li>. */
  children: ReactNode;
  cardCount: number;
  isFiltered: boolean;
  dropRef?: Ref<HTMLElement>;
  isDropTarget?: boolean;
}

/** One stage of the board: a region named by the stage, holding an ordered list of job cards. */
export function StageColumn({ stage, children, cardCount, isFiltered, dropRef, isDropTarget = false }: StageColumnProps) {
  const isOver = wipState(stage.jobCount, stage.wipLimit) === 'over';
  return (
    <section
      ref={dropRef}
      aria-label={stage.name}
      className={cx(
        'flex w-[min(18rem,85vw)] shrink-0 snap-start flex-col rounded-lg border bg-graphite-100',
        isOver ? 'border-damper' : 'border-graphite-300',
        isDropTarget && 'outline-2 outline-offset-2 outline-spruce',
      )}
    >
      <StageHeader name={stage.name} jobCount={stage.jobCount} wipLimit={stage.wipLimit} shownCount={isFiltered ? cardCount : undefined} />
      <div className="flex-1 p-2">
        {cardCount === 0 && <p className="px-1 py-2 text-sm text-graphite-600">{isFiltered ? 'No matching jobs here.' : 'No jobs here yet.'}</p>}
        <ol aria-label={`Jobs in ${stage.name}`} className="flex min-h-24 flex-col gap-2">
          {children}
        </ol>
      </div>
    </section>
  );
}
