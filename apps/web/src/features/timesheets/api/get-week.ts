import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { TimesheetWeek } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { timesheetKeys, type WeekKey } from './keys';

const weekQuery = ({ technicianId, weekStart }: WeekKey, format?: 'csv') => {
  const query = new URLSearchParams({ weekStart });
  if (technicianId) query.set('technicianId', technicianId);
  if (format) query.set('format', format);
  return query.toString();
};

export const getWeek = (week: WeekKey) => api.get(`/time/weeks?${weekQuery(week)}`, TimesheetWeek);

/** Where the browser downloads the week as CSV (the API names the file). */
export const weekCsvHref = (week: WeekKey) => `/api/time/weeks?${weekQuery(week, 'csv')}`;

export const weekQueryOptions = (week: WeekKey) => queryOptions({ queryKey: timesheetKeys.detail(week), queryFn: () => getWeek(week) });

/** The previous week stays on screen while the next one loads, so the page does not jump. */
export const useWeek = (week: WeekKey) => useQuery({ ...weekQueryOptions(week), placeholderData: keepPreviousData });
