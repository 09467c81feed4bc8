import { useMemo, useState, type ReactNode } from 'react';
import { DndContext, DragOverlay, KeyboardSensor, TouchSensor, useSensor, useSensors } from '@dnd-kit/core';
import type { Board, BoardJob } from '@keybed/shared';
import { RegionBoundary } from '@/components/region-boundary';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { useMoveJob } from '../api/move-job';
import { useBoardDrag, type Drop } from '../hooks/use-board-drag';
import { usePrefersReducedMotion } from '../hooks/use-prefers-reduced-motion';
import { boardAnnouncements, screenReaderInstructions } from '../lib/announcements';
import { serverIndexFor } from '../lib/apply-move';
import { boardCollisions } from '../lib/collisions';
import { boardKeyboardCoordinates } from '../lib/keyboard-coordinates';
import { MouseAndPenSensor } from '../lib/mouse-and-pen-sensor';
import { isFullFor } from '../lib/wip';
import { DroppableStageColumn } from './droppable-stage-column';
import { JobCard } from './job-card';
import { GripMark, SortableJobCard } from './sortable-job-card';
import { WipConfirmDialog, type HeldMove } from './wip-confirm-dialog';

/** Long enough for the dialog to close; until then the rest of the page cannot take focus. */
const AFTER_DIALOG_MS = 50;

/** The card re-renders in its final column after the dialog, so focus goes back to its handle there. */
function refocusHandle(jobId: string) {
  setTimeout(() => document.querySelector<HTMLElement>(`[data-move-handle="${CSS.escape(jobId)}"]`)?.focus(), AFTER_DIALOG_MS);
}

interface MovableBoardProps {
  board: Board;
  unit: PreferredLengthUnit;
  today: string;
  isFiltered: boolean;
  cardExtras?: ((job: BoardJob) => ReactNode) | undefined;
}

/** The board for owners and foremen: cards move by mouse, touch and keyboard. */
export function MovableBoard({ board, unit, today, isFiltered, cardExtras }: MovableBoardProps) {
  const move = useMoveJob();
  const isReducedMotion = usePrefersReducedMotion();
  const [held, setHeld] = useState<{ drop: Drop; view: HeldMove } | null>(null);
  const sensors = useSensors(
    useSensor(MouseAndPenSensor, { activationConstraint: { distance: 6 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 200, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: boardKeyboardCoordinates }),
  );
  const jobsById = useMemo(() => new Map<string, BoardJob>(board.stages.flatMap((s) => s.jobs.map((j) => [j.id, j] as const))), [board]);
  const stagesById = useMemo(() => new Map(board.stages.map((s) => [s.id, s])), [board]);

  function send(drop: Drop) {
    const job = jobsById.get(drop.jobId);
    const index = serverIndexFor(board, drop.jobId, drop.toStageId, drop.visibleIndex);
    if (job && index !== undefined) move.mutate({ job, toStageId: drop.toStageId, index });
  }

  const drag = useBoardDrag(board, (drop) => {
    const target = stagesById.get(drop.toStageId);
    const job = jobsById.get(drop.jobId);
    if (!target || !job || drop.toStageId === drop.fromStageId || !isFullFor(target.jobCount, target.wipLimit)) {
      send(drop);
      return 'commit';
    }
    const fromStageName = stagesById.get(drop.fromStageId)?.name ?? '';
    setHeld({ drop, view: { jobTitle: job.title, fromStageName, toStageName: target.name, jobCount: target.jobCount, wipLimit: target.wipLimit! } });
    return 'hold';
  });

  const announcements = useMemo(
    () =>
      boardAnnouncements({
        titleOf: (id) => jobsById.get(id)?.title ?? 'The job',
        stageNameOf: (id) => stagesById.get(id)?.name ?? 'a stage',
        placeOf: drag.placeOf,
      }),
    // placeOf reads the live layout through a ref, so the board alone decides when names change.
    [jobsById, stagesById],
  );
  const activeJob = drag.activeId ? jobsById.get(drag.activeId) : undefined;
  const overStageId = drag.activeId ? drag.placeOf(drag.activeId)?.stageId : undefined;

  return (
    <DndContext
      sensors={sensors}
      collisionDetection={boardCollisions(drag.columns)}
      // Scroll the board only when a card is held close to its edge, not across a fifth of a wide screen.
      autoScroll={{ threshold: { x: 0.08, y: 0.15 } }}
      accessibility={{ announcements, screenReaderInstructions }}
      {...drag.handlers}
    >
      {board.stages.map((stage) => {
        const cardIds = drag.columns[stage.id] ?? [];
        return (
          <RegionBoundary key={stage.id} className="w-72 shrink-0">
            <DroppableStageColumn
              stage={stage}
              cardIds={cardIds}
              isFiltered={isFiltered}
              isDropTarget={overStageId === stage.id && drag.originStageId !== stage.id}
            >
              {cardIds.map((id) => {
                const job = jobsById.get(id);
                return job ? <SortableJobCard key={id} job={job} stageId={stage.id} unit={unit} today={today} footerExtras={cardExtras?.(job)} /> : null;
              })}
            </DroppableStageColumn>
          </RegionBoundary>
        );
      })}
      <DragOverlay dropAnimation={isReducedMotion ? null : { duration: 150 }}>
        {/* Not rotated or scaled: keyboard moves measure the lifted card against the others. */}
        {activeJob && <JobCard job={activeJob} unit={unit} today={today} handle={<GripMark />} footerExtras={cardExtras?.(activeJob)} isOverlay className="shadow-lg" />}
      </DragOverlay>
      <WipConfirmDialog
        held={held?.view ?? null}
        onConfirm={() => {
          if (!held) return;
          drag.confirmHeld();
          send(held.drop);
          setHeld(null);
          refocusHandle(held.drop.jobId);
        }}
        onCancel={() => {
          drag.cancelHeld();
          setHeld(null);
          if (held) refocusHandle(held.drop.jobId);
        }}
      />
    </DndContext>
  );
}
