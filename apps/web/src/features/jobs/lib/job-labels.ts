import type { JobPriority, JobStatus } from '@keybed/shared';

export const STATUS_LABELS: Record<JobStatus, string> = { active: 'Active', on_hold: 'On hold', done: 'Done', cancelled: 'Cancelled', proposed: 'Proposed' };
export const PRIORITY_LABELS: Record<JobPriority, string> = { low: 'Low', normal: 'Normal', high: 'High', urgent: 'Urgent' };

/** What a member can set; a job is proposed only by preparing an estimate from a survey. */
export const STATUS_OPTIONS = (Object.keys(STATUS_LABELS) as JobStatus[]).filter((value) => value !== 'proposed').map((value) => ({ value, label: STATUS_LABELS[value] }));
export const PRIORITY_OPTIONS = (Object.keys(PRIORITY_LABELS) as JobPriority[]).map((value) => ({ value, label: PRIORITY_LABELS[value] }));
