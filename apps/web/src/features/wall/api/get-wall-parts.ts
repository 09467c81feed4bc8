import { queryOptions, useQuery } from '@tanstack/react-query';
import { WallPartList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { wallKeys } from './keys';

export const getWallParts = () => api.get('/wall/parts', WallPartList);

/** The active parts and what is on hand, for logging parts used; read afresh each time the picker opens. */
export const wallPartsQueryOptions = () =>
  queryOptions({
    queryKey: wallKeys.parts(),
    queryFn: getWallParts,
    select: (data) => data.parts,
    staleTime: 0,
  });

export const useWallParts = () => useQuery(wallPartsQueryOptions());
