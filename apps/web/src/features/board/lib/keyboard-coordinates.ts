import type { ClientRect, DroppableContainer, KeyboardCoordinateGetter, UniqueIdentifier } from '@dnd-kit/core';
import { sortableKeyboardCoordinates } from '@dnd-kit/sortable';

type Context = Parameters<KeyboardCoordinateGetter>[1]['context'];

const centreX = (rect: ClientRect) => rect.left + rect.width / 2;

/** The board's columns left to right, and which one the lifted card is in. */
function columnsAround(context: Context) {
  const { droppableContainers, droppableRects, collisionRect } = context;
  const columns = droppableContainers
    .getEnabled()
    .filter((c) => c.data.current?.type === 'stage')
    .flatMap((c) => {
      const rect = droppableRects.get(c.id);
      return rect ? [{ container: c, rect }] : [];
    })
    .sort((a, b) => a.rect.left - b.rect.left);
  const x = collisionRect ? centreX(collisionRect) : Number.NaN;
  const index = columns.findIndex(({ rect }) => x >= rect.left && x <= rect.right);
  return { columns, index };
}

/**
 * Arrow keys on the board: left and right go to the neighbouring column, keeping the card's height
 * where the column allows; up and down move among the cards of the column the card is in only.
 */
export const boardKeyboardCoordinates: KeyboardCoordinateGetter = (event, args) => {
  const { context } = args;
  const { collisionRect, droppableContainers, droppableRects } = context;
  const isSideways = event.code === 'ArrowLeft' || event.code === 'ArrowRight';
  if (!collisionRect || !(isSideways || event.code === 'ArrowUp' || event.code === 'ArrowDown')) {
    return sortableKeyboardCoordinates(event, args);
  }
  const { columns, index } = columnsAround(context);
  const current = columns[index];
  if (isSideways) {
    event.preventDefault();
    const next = columns[index + (event.code === 'ArrowRight' ? 1 : -1)];
    if (!current || !next) return undefined;
    const top = Math.max(next.rect.top, Math.min(collisionRect.top, next.rect.bottom - collisionRect.height));
    return { x: next.rect.left + (next.rect.width - collisionRect.width) / 2, y: top };
  }
  if (!current) return sortableKeyboardCoordinates(event, args);
  const inColumn = droppableContainers.getEnabled().filter((c: DroppableContainer) => {
    const rect = droppableRects.get(c.id);
    return c.data.current?.type !== 'stage' && rect !== undefined && centreX(rect) >= current.rect.left && centreX(rect) <= current.rect.right;
  });
  // The sortable getter reads only getEnabled() and get(); everything else stays the board's own.
  const onlyThisColumn = { getEnabled: () => inColumn, get: (id: UniqueIdentifier) => droppableContainers.get(id) } as unknown as typeof droppableContainers;
  return sortableKeyboardCoordinates(event, { ...args, context: { ...context, droppableContainers: onlyThisColumn } });
};
