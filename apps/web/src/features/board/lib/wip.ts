export type WipState = 'none' | 'under' | 'at' | 'over';

/** Where a stage stands against its WIP limit; `jobCount` counts every job in it, filtered or not. */
export function wipState(jobCount: number, wipLimit: number | null): WipState {
  if (wipLimit === null) return 'none';
  if (jobCount > wipLimit) return 'over';
  return jobCount === wipLimit ? 'at' : 'under';
}

/** Moving a job into a stage that is already at or over its limit asks first. */
export const isFullFor = (jobCount: number, wipLimit: number | null) => wipLimit !== null && jobCount >= wipLimit;
