import type { JobStageEvent } from '@keybed/shared';

export interface StageSpell {
  event: JobStageEvent;
  /** How long the job stayed in the stage it entered with this event, in milliseconds. */
  durationMs: number;
  /** The job is still in this stage; the duration runs to `now`. */
  isCurrent: boolean;
}

/** Each stage change with the time the job then spent in that stage; history is oldest first. */
export function stageSpells(history: readonly JobStageEvent[], now: Date): StageSpell[] {
  return history.map((event, index) => {
    const next = history[index + 1];
    const end = next ? Date.parse(next.at) : now.getTime();
    return { event, durationMs: Math.max(0, end - Date.parse(event.at)), isCurrent: next === undefined };
  });
}
