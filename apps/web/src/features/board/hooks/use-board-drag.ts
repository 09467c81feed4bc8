import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { arrayMove } from '@dnd-kit/sortable';
import type { DragEndEvent, DragOverEvent, DragStartEvent } from '@dnd-kit/core';
import type { Board } from '@keybed/shared';

/** Stage id → the ids of its visible jobs, in order. */
export type Columns = Record<string, string[]>;

export interface Drop {
  jobId: string;
  fromStageId: string;
  toStageId: string;
  /** Place in the target column as shown (it may be filtered). */
  visibleIndex: number;
}

type Phase = 'idle' | 'dragging' | 'held' | 'settling';

/** How long a dropped layout waits for the board to catch up before showing the board as it is. */
const SETTLE_TIMEOUT_MS = 1500;

export const columnsOf = (board: Board): Columns => Object.fromEntries(board.stages.map((s) => [s.id, s.jobs.map((j) => j.id)]));

export function containerOf(columns: Columns, id: string): string | undefined {
  return id in columns ? id : Object.keys(columns).find((stageId) => columns[stageId]!.includes(id));
}

/**
 * The board's drag state: while a card is in the air, and until the board shows its drop, columns
 * come from a local layout. `onDrop` answers 'hold' to keep the layout while the member confirms.
 */
export function useBoardDrag(board: Board, onDrop: (drop: Drop) => 'commit' | 'hold') {
  const [layout, setLayout] = useState<Columns | null>(null);
  const [activeId, setActiveId] = useState<string | null>(null);
  const [phase, setPhase] = useState<Phase>('idle');
  const layoutRef = useRef<Columns | null>(null);
  const originRef = useRef<{ stageId: string; index: number } | null>(null);
  const boardAtDropRef = useRef<Board | null>(null);

  const show = useCallback((next: Columns | null) => {
    layoutRef.current = next;
    setLayout(next);
  }, []);

  const reset = useCallback(() => {
    show(null);
    setActiveId(null);
    setPhase('idle');
    originRef.current = null;
  }, [show]);

  const settle = useCallback(() => {
    boardAtDropRef.current = board;
    setPhase('settling');
  }, [board]);

  useEffect(() => {
    if (phase === 'settling' && board !== boardAtDropRef.current) reset();
  }, [board, phase, reset]);

  useEffect(() => {
    if (phase !== 'settling') return;
    const timer = setTimeout(reset, SETTLE_TIMEOUT_MS);
    return () => clearTimeout(timer);
  }, [phase, reset]);

  function onDragStart({ active }: DragStartEvent) {
    const columns = columnsOf(board);
    const id = String(active.id);
    const stageId = containerOf(columns, id);
    if (!stageId) return;
    originRef.current = { stageId, index: columns[stageId]!.indexOf(id) };
    show(columns);
    setActiveId(id);
    setPhase('dragging');
  }

  /** Crossing into another column moves the card there at once, so the column opens a gap for it. */
  function onDragOver({ active, over }: DragOverEvent) {
    const current = layoutRef.current;
    if (!current || !over) return;
    const id = String(active.id);
    const overId = String(over.id);
    const from = containerOf(current, id);
    const to = containerOf(current, overId);
    if (!from || !to || from === to) return;
    const target = current[to]!;
    let index = target.length;
    if (overId !== to) {
      const translated = active.rect.current.translated;
      const isBelow = translated !== null && translated.top > over.rect.top + over.rect.height / 2;
      index = target.indexOf(overId) + (isBelow ? 1 : 0);
    }
    show({ ...current, [from]: current[from]!.filter((j) => j !== id), [to]: [...target.slice(0, index), id, ...target.slice(index)] });
  }

  function onDragEnd({ active, over }: DragEndEvent) {
    const current = layoutRef.current;
    const origin = originRef.current;
    const id = String(active.id);
    setActiveId(null);
    const stageId = current && over ? containerOf(current, id) : undefined;
    const overStageId = current && over ? containerOf(current, String(over.id)) : undefined;
    if (!current || !origin || !over || !stageId || stageId !== overStageId) return reset();
    let final = current;
    const from = current[stageId]!.indexOf(id);
    const to = current[stageId]!.indexOf(String(over.id));
    if (to >= 0 && from !== to) final = { ...current, [stageId]: arrayMove(current[stageId]!, from, to) };
    const visibleIndex = final[stageId]!.indexOf(id);
    if (stageId === origin.stageId && visibleIndex === origin.index) return reset();
    show(final);
    const decision = onDrop({ jobId: id, fromStageId: origin.stageId, toStageId: stageId, visibleIndex });
    if (decision === 'hold') setPhase('held');
    else settle();
  }

  const columns = useMemo(() => layout ?? columnsOf(board), [layout, board]);

  return {
    columns,
    activeId,
    originStageId: originRef.current?.stageId,
    handlers: { onDragStart, onDragOver, onDragEnd, onDragCancel: reset },
    /** The member confirmed a held drop; the caller sends the move. */
    confirmHeld: settle,
    /** The member cancelled a held drop; the card goes back where it was. */
    cancelHeld: reset,
    /** Where a job or stage id sits in the columns on screen right now (for announcements). */
    placeOf: (id: string) => {
      const shown = layoutRef.current ?? columnsOf(board);
      const stageId = containerOf(shown, id);
      if (!stageId) return undefined;
      const list = shown[stageId]!;
      return { stageId, index: list.indexOf(id), count: list.length };
    },
  };
}
