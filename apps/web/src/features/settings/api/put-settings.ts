import { useMutation, useQueryClient } from '@tanstack/react-query';
import { WorkshopSettings, type PutSettingsInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

export const putSettings = (input: PutSettingsInput) => api.put('/settings', input, WorkshopSettings);

/** Saves every setting at once; the form shows field errors itself. */
export function usePutSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: putSettings,
    meta: { handlesError: true },
    onSuccess: (saved) => queryClient.setQueryData(settingsKeys.workshop(), saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.workshop() }),
  });
}
