import { z } from 'zod';

export const JOB_STATUSES = ['active', 'on_hold', 'done', 'cancelled'] as const;
export const JobStatus = z.enum(JOB_STATUSES, { error: 'Choose active, on hold, done or cancelled' });
export type JobStatus = z.infer<typeof JobStatus>;

/** Statuses that keep a job on the board (with a position in its stage). */
export const ON_BOARD_STATUSES = ['active', 'on_hold'] as const satisfies readonly JobStatus[];
export const isOnBoard = (status: JobStatus) => (ON_BOARD_STATUSES as readonly JobStatus[]).includes(status);
