import type { Job } from '@keybed/shared';
import type { JobRow } from './jobs.repo';
import type { Technician } from './technicians';

/** A job row as the wire contract shows it. */
export const toJob = (j: JobRow, technicians: Technician[] = []): Job => ({
  id: j.id,
  title: j.title,
  status: j.status,
  priority: j.priority,
  stageId: j.stageId,
  position: j.position,
  promisedOn: j.promisedOn,
  isBlocked: j.isBlocked,
  blockedReason: j.blockedReason,
  notes: j.notes,
  version: j.version,
  client: j.client,
  piano: j.piano,
  technicians,
  createdAt: j.createdAt.toISOString(),
  updatedAt: j.updatedAt.toISOString(),
});
