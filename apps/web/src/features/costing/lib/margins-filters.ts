import { DateOnly, JobStatus, type FieldErrors } from '@keybed/shared';
import type { MarginsFilters } from '../api/keys';

/**
 * The report's filters from its URL (`?from=2026-01-01&to=2026-06-30&status=active`). Anything
 * unreadable is left out of the query and reported on its field, so the page never asks the API
 * for what it would refuse.
 */
export function marginsFiltersFrom(params: URLSearchParams): { filters: MarginsFilters; problems: FieldErrors } {
  const filters: MarginsFilters = {};
  const problems: FieldErrors = {};
  for (const key of ['from', 'to'] as const) {
    const value = params.get(key);
    if (!value) continue;
    if (DateOnly.safeParse(value).success) filters[key] = value;
    else problems[key] = ['Use a date like 2026-12-24'];
  }
  const status = params.get('status');
  if (status) {
    const parsed = JobStatus.safeParse(status);
    if (parsed.success) filters.status = parsed.data;
    else problems.status = ['Choose a status from the list'];
  }
  if (filters.from && filters.to && filters.from > filters.to) {
    problems.to = ['The end must not be before the start'];
    delete filters.to;
  }
  return { filters, problems };
}

/** The URL's search after changing some filters; an empty value removes its filter. */
export function withMarginsFilters(params: URLSearchParams, changes: Partial<Record<'from' | 'to' | 'status', string>>): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const [key, value] of Object.entries(changes)) {
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}

/** Hours used against the estimate, for meters: the share used (0 when nothing is estimated) and whether it ran over. */
export function hoursUse(estimatedMinutes: number, actualMinutes: number): { ratio: number; isOver: boolean } {
  if (estimatedMinutes <= 0) return { ratio: actualMinutes > 0 ? 1 : 0, isOver: actualMinutes > 0 };
  return { ratio: actualMinutes / estimatedMinutes, isOver: actualMinutes > estimatedMinutes };
}
