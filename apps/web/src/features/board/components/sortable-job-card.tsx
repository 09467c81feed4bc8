import type { KeyboardEventHandler } from 'react';
import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { cx } from '@/lib/cx';
import { JobCard, type JobCardProps } from './job-card';

function GripIcon() {
  return (
    <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4">
      <rect x="2" y="3" width="12" height="2" rx="1" fill="currentColor" />
      <rect x="2" y="7" width="12" height="2" rx="1" fill="currentColor" />
      <rect x="2" y="11" width="12" height="2" rx="1" fill="currentColor" />
    </svg>
  );
}

/** The handle's look without its behaviour, for the lifted copy of a card. */
export function GripMark() {
  return (
    <span aria-hidden="true" className="-m-1 flex size-7 shrink-0 items-center justify-center text-graphite-600">
      <GripIcon />
    </span>
  );
}

interface SortableJobCardProps extends Omit<JobCardProps, 'handle' | 'isOverlay'> {
  stageId: string;
}

/**
 * A card that owners and foremen can drag: by mouse or touch anywhere on it, by keyboard from its
 * handle (space or enter picks it up). While it is in the air, a faded copy marks its place.
 */
export function SortableJobCard({ stageId, ...card }: SortableJobCardProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: card.job.id,
    data: { type: 'job', stageId },
  });
  const { onKeyDown, ...pointerListeners } = listeners ?? {};

  const handle = (
    <button
      type="button"
      ref={setActivatorNodeRef}
      {...attributes}
      aria-roledescription="movable job"
      aria-label={`Move ${card.job.title}`}
      data-move-handle={card.job.id}
      onKeyDown={onKeyDown as KeyboardEventHandler<HTMLButtonElement> | undefined}
      className="-m-1 flex size-7 shrink-0 cursor-grab touch-none items-center justify-center rounded text-graphite-600 hover:bg-graphite-100 hover:text-ink"
    >
      <GripIcon />
    </button>
  );

  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      {...pointerListeners}
      className={cx('list-none', isDragging && 'opacity-40')}
    >
      <JobCard {...card} handle={handle} />
    </li>
  );
}
