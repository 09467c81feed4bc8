import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PinStatus } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

export const unlockPin = (membershipId: string) =>
  api.post(`/team/members/${encodeURIComponent(membershipId)}/unlock-pin`, {}, PinStatus);

/** An owner or foreman lifts a PIN lock early; the technicians list shows it at once. */
export function useUnlockPin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: unlockPin,
    onSettled: () => queryClient.invalidateQueries({ queryKey: benchKeys.technicians() }),
  });
}
