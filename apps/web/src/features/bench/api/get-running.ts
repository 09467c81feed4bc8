import { queryOptions, useQuery } from '@tanstack/react-query';
import { RunningList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

export const getRunning = () => api.get('/time/running', RunningList);

/** Who is clocked on to what right now; live events keep it fresh. */
export const runningQueryOptions = () =>
  queryOptions({ queryKey: benchKeys.running(), queryFn: getRunning, select: (data) => data.running });

export const useRunning = () => useQuery(runningQueryOptions());
