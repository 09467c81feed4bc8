import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { wallKeys } from './keys';

export const revokeWallDevice = (deviceId: string) => api.delete(`/wall/devices/${encodeURIComponent(deviceId)}`);

/** Unpairs a screen at once: its next request is refused. */
export function useRevokeWallDevice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeWallDevice,
    onSettled: () => queryClient.invalidateQueries({ queryKey: wallKeys.devices() }),
  });
}
