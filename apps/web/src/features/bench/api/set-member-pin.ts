import type { SetMemberPinInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

/** The owner sets a member's PIN (by membership id); it also lifts any lock. */
export const setMemberPin = (membershipId: string, input: SetMemberPinInput) =>
  api.put(`/team/members/${encodeURIComponent(membershipId)}/pin`, input);
