import type { SetOwnPinInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

/** Sends the new PIN once; callers keep it in no state or cache afterwards. */
export const setOwnPin = (input: SetOwnPinInput) => api.put('/me/pin', input);
