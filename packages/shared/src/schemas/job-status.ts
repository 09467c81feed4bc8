import { z } from 'zod';

/**
 * `proposed`: prepared from a survey with an estimate the client has not accepted yet; such a job
 * waits off the board and joins its first stage when the client accepts.
 */
export const JOB_STATUSES = ['active', 'on_hold', 'done', 'cancelled', 'proposed'] as const;
export const JobStatus = z.enum(JOB_STATUSES, { error: 'Choose active, on hold, done or cancelled' });
export type JobStatus = z.infer<typeof JobStatus>;

/** Statuses a member may set on a job; a job becomes proposed only by preparing an estimate from a survey. */
export const SettableJobStatus = JobStatus.exclude(['proposed'], { error: 'Choose active, on hold, done or cancelled' });

/** Statuses that keep a job on the board (with a position in its stage). */
export const ON_BOARD_STATUSES = ['active', 'on_hold'] as const satisfies readonly JobStatus[];
export const isOnBoard = (status: JobStatus) => (ON_BOARD_STATUSES as readonly JobStatus[]).includes(status);
