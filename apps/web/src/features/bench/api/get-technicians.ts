import { queryOptions, useQuery } from '@tanstack/react-query';
import { BenchTechnicianList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

export const getTechnicians = () => api.get('/technicians', BenchTechnicianList);

/** Every active member (technicians first), for assigning tasks, picking a timesheet and PINs. */
export const techniciansQueryOptions = () =>
  queryOptions({ queryKey: benchKeys.technicians(), queryFn: getTechnicians, select: (data) => data.technicians });

export const useTechnicians = () => useQuery(techniciansQueryOptions());
