import { useMutation, useQueryClient } from '@tanstack/react-query';
import { TimeEntry, type CorrectionInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { timesheetKeys } from './keys';

interface CorrectEntryVariables {
  entryId: string;
  correction: CorrectionInput;
}

export const correctEntry = ({ entryId, correction }: CorrectEntryVariables) =>
  api.patch(`/time/entries/${encodeURIComponent(entryId)}`, correction, TimeEntry);

/** A correction can move minutes between days and weeks, so every loaded week is refreshed. */
export function useCorrectEntry() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: correctEntry,
    meta: { handlesError: true },
    onSettled: () => queryClient.invalidateQueries({ queryKey: timesheetKeys.all }),
  });
}
