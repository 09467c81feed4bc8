import { ClockResult, WallTechnicianTasks, type WallClockOffInput, type WallClockOnInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

/*
 * Requests that carry a technician's PIN. They are plain calls, never query-client mutations, so
 * the PIN is not kept in any cache once the request has gone.
 */

/** Checks the PIN; answers what the technician is on and their open tasks (assigned first). */
export const verifyPin = (technicianId: string, pin: string) =>
  api.post(`/wall/technicians/${encodeURIComponent(technicianId)}/verify-pin`, { pin }, WallTechnicianTasks);

export const wallClockOn = (input: WallClockOnInput) => api.post('/wall/clock-on', input, ClockResult);

export const wallClockOff = (input: WallClockOffInput) => api.post('/wall/clock-off', input, ClockResult);
