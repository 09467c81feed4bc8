import { queryOptions, useQuery } from '@tanstack/react-query';
import { WorkshopSettings } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

export const getSettings = () => api.get('/settings', WorkshopSettings);

/** The workshop's settings as the member's role may see them (money fields absent for some roles). */
export const settingsQueryOptions = () => queryOptions({ queryKey: settingsKeys.workshop(), queryFn: getSettings, staleTime: 5 * 60_000 });

export const useWorkshopSettings = () => useQuery(settingsQueryOptions());
