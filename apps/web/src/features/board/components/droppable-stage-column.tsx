import type { ReactNode } from 'react';
import { useDroppable } from '@dnd-kit/core';
import { SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';
import type { Board } from '@keybed/shared';
import { StageColumn } from './stage-column';

interface DroppableStageColumnProps {
  stage: Board['stages'][number];
  cardIds: string[];
  isFiltered: boolean;
  /** A card from another stage is over this one. */
  isDropTarget: boolean;
  children: ReactNode;
}

/** A column that takes dropped cards, even when it is empty, and sorts the cards within it. */
export function DroppableStageColumn({ stage, cardIds, isFiltered, isDropTarget, children }: DroppableStageColumnProps) {
  const { setNodeRef } = useDroppable({ id: stage.id, data: { type: 'stage' } });
  return (
    <SortableContext id={stage.id} items={cardIds} strategy={verticalListSortingStrategy}>
      <StageColumn stage={stage} cardCount={cardIds.length} isFiltered={isFiltered} dropRef={setNodeRef} isDropTarget={isDropTarget}>
        {children}
      </StageColumn>
    </SortableContext>
  );
}
