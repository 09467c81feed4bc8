import { ClockResult, StockMovementResult, WallPinCheck, type WallClockOffInput, type WallClockOnInput, type WallPartsUsedInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

/*
 * Requests that carry a technician's PIN or clock grant. They are plain calls, never query-client
 * mutations, so neither is kept in any cache once the request has gone.
 */

/** Checks the PIN; answers what the technician is on, their open tasks (assigned first) and a clock grant. */
export const verifyPin = (technicianId: string, pin: string) =>
  api.post(`/wall/technicians/${encodeURIComponent(technicianId)}/verify-pin`, { pin }, WallPinCheck);

export const wallClockOn = (input: WallClockOnInput) => api.post('/wall/clock-on', input, ClockResult);

export const wallClockOff = (input: WallClockOffInput) => api.post('/wall/clock-off', input, ClockResult);

/** Parts used on a task, confirmed with the PIN held for this turn; answers the movement and the part's stock. */
export const wallLogPart = (input: WallPartsUsedInput) => api.post('/wall/parts-used', input, StockMovementResult);
