import type { Role } from '@keybed/shared';
import { AppError } from '../../http/errors';
import { constraintOf, isExclusionViolation, isUniqueViolation } from '../../lib/pg-errors';
import type { Tx } from '../auth/auth.repo';
import { weekKeyOf } from './entry-view';
import type { TimeRepo } from './time.repo';

/**
 * Refuses a change touching an approved week of the technician (the weeks of the given instants,
 * in the workshop's time zone) unless the caller is the owner.
 */
export async function checkWeekOpen(repo: TimeRepo, tx: Tx, workshopId: string, technicianId: string, instants: Date[], timeZone: string, role?: Role) {
  if (role === 'owner') return;
  const [week] = await repo.approvalsOf(workshopId, technicianId, [...new Set(instants.map((at) => weekKeyOf(at, timeZone)))], tx);
  if (week) {
    const by = week.by ? ` by ${week.by.name}` : '';
    throw new AppError('week_approved', 409, `The week of ${week.weekStart} was approved${by}. Only the owner can change it now.`);
  }
}

/** Turns a broken time-entry constraint into a clear 409; anything else is rethrown as it is. */
export function translateEntryConstraint(err: unknown): never {
  if (isExclusionViolation(err)) {
    throw new AppError('conflict', 409, 'That would overlap another time entry of the same technician. Entries of one technician never overlap.');
  }
  if (isUniqueViolation(err)) {
    const constraint = constraintOf(err);
    if (constraint === 'time_entries_one_running_per_technician') {
      throw new AppError('conflict', 409, 'Another clock action for this technician happened at the same moment. Check who is on what and try again.');
    }
    if (constraint === 'time_entries_idempotency_key' || constraint === 'time_entries_stop_idempotency_key') {
      throw new AppError('conflict', 409, 'This idempotency key was already used for a different clock action', { idempotencyKey: ['Already used for a different action'] });
    }
  }
  throw err;
}
