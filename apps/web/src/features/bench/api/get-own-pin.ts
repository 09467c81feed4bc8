import { queryOptions, useQuery } from '@tanstack/react-query';
import { PinStatus } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

export const getOwnPin = () => api.get('/me/pin', PinStatus);

export const ownPinQueryOptions = () => queryOptions({ queryKey: benchKeys.ownPin(), queryFn: getOwnPin });

export const useOwnPin = () => useQuery(ownPinQueryOptions());
