import { queryOptions, useQuery } from '@tanstack/react-query';
import { WallTechnicianList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { wallKeys } from './keys';

export const getWallTechnicians = () => api.get('/wall/technicians', WallTechnicianList);

/**
 * Everyone who clocks on at the wall, with what they are on. Live events refresh it; it is also
 * asked for every `pollMs` so a dropped stream never leaves the screen stale for long.
 */
export const wallTechniciansQueryOptions = (pollMs: number) =>
  queryOptions({
    queryKey: wallKeys.technicians(),
    queryFn: getWallTechnicians,
    select: (data) => data.technicians,
    refetchInterval: pollMs,
    refetchIntervalInBackground: true,
    staleTime: 5_000,
  });

export const useWallTechnicians = (pollMs: number) => useQuery(wallTechniciansQueryOptions(pollMs));
