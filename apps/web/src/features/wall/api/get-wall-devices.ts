import { queryOptions, useQuery } from '@tanstack/react-query';
import { WallDeviceList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { wallKeys } from './keys';

export const getWallDevices = () => api.get('/wall/devices', WallDeviceList);

/** Paired screens, active ones first. */
export const wallDevicesQueryOptions = () => queryOptions({ queryKey: wallKeys.devices(), queryFn: getWallDevices, select: (data) => data.devices });

export const useWallDevices = () => useQuery(wallDevicesQueryOptions());
