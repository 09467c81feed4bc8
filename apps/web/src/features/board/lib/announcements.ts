import type { Announcements, ScreenReaderInstructions } from '@dnd-kit/core';

interface Place {
  stageId: string;
  index: number;
  count: number;
}

interface AnnouncementContext {
  titleOf: (jobId: string) => string;
  stageNameOf: (stageId: string) => string;
  placeOf: (id: string) => Place | undefined;
}

export const screenReaderInstructions: ScreenReaderInstructions = {
  draggable:
    'To move this job, press space or enter to pick it up. Use the up and down arrow keys to change its place in the stage, ' +
    'and the left and right arrow keys to take it to another stage. Press space or enter again to put it down, or escape to leave it where it was.',
};

/** Where a card being dragged is, in words: the stage, and its place there. */
function whereIs(ctx: AnnouncementContext, jobId: string, overId: string): string {
  const over = ctx.placeOf(overId);
  if (!over) return 'not over a stage';
  const stage = ctx.stageNameOf(over.stageId);
  if (over.index === -1) return over.count === 0 ? `over ${stage}, which is empty` : `over ${stage}, at the end`;
  const own = ctx.placeOf(jobId);
  const count = own?.stageId === over.stageId ? over.count : over.count + 1;
  return `in ${stage}, position ${over.index + 1} of ${count}`;
}

/** What screen readers hear while a job card is picked up, moved, put down or put back. */
export function boardAnnouncements(ctx: AnnouncementContext): Announcements {
  let originStage = '';
  return {
    onDragStart({ active }) {
      const place = ctx.placeOf(String(active.id));
      originStage = place ? ctx.stageNameOf(place.stageId) : '';
      const where = place ? ` It is in ${originStage}, position ${place.index + 1} of ${place.count}.` : '';
      return `Picked up ${ctx.titleOf(String(active.id))}.${where}`;
    },
    onDragOver({ active, over }) {
      const title = ctx.titleOf(String(active.id));
      return over ? `${title} is ${whereIs(ctx, String(active.id), String(over.id))}.` : `${title} is not over a stage.`;
    },
    onDragEnd({ active, over }) {
      const title = ctx.titleOf(String(active.id));
      // By now the drop is laid out, so the card's own place is where it landed.
      const place = over ? ctx.placeOf(String(active.id)) : undefined;
      if (!place) return `${title} was put back in ${originStage}.`;
      return `${title} was put down in ${ctx.stageNameOf(place.stageId)}, position ${place.index + 1} of ${place.count}.`;
    },
    onDragCancel({ active }) {
      return `Move cancelled. ${ctx.titleOf(String(active.id))} is back in ${originStage}.`;
    },
  };
}
