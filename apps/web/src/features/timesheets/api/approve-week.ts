import { useMutation, useQueryClient } from '@tanstack/react-query';
import { WeekApproval, type ApproveWeekInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { timesheetKeys } from './keys';

export const approveWeek = (input: ApproveWeekInput) => api.post('/time/weeks/approve', input, WeekApproval);

/** Approving locks the week's entries; the week is read again to show who approved it. */
export function useApproveWeek() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveWeek,
    onSettled: (_approval, _error, input) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: timesheetKeys.detail({ technicianId: input.technicianId, weekStart: input.weekStart }) }),
        queryClient.invalidateQueries({ queryKey: timesheetKeys.detail({ weekStart: input.weekStart }) }),
      ]),
  });
}
