import { closestCenter, getFirstCollision, pointerWithin, rectIntersection, type CollisionDetection } from '@dnd-kit/core';
import type { Columns } from '../hooks/use-board-drag';

/**
 * What a dragged card is over: under the pointer if there is one (mouse, touch), else where the
 * card itself lies (keyboard). Over a column with cards, the nearest card in it wins, so the
 * column opens a gap at the right place rather than only at its end.
 */
export function boardCollisions(columns: Columns): CollisionDetection {
  return (args) => {
    const underPointer = pointerWithin(args);
    const hits = underPointer.length > 0 ? underPointer : rectIntersection(args);
    const first = getFirstCollision(hits, 'id');
    if (first === null) return [];
    const cardIds = columns[String(first)];
    if (cardIds && cardIds.length > 0) {
      const cards = args.droppableContainers.filter((c) => cardIds.includes(String(c.id)));
      return closestCenter({ ...args, droppableContainers: cards });
    }
    return [{ id: first }];
  };
}
