import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Piano, type UpdatePianoInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { pianoKeys } from './keys';

interface UpdatePianoVariables {
  pianoId: string;
  changes: UpdatePianoInput;
}

export const updatePiano = ({ pianoId, changes }: UpdatePianoVariables) =>
  api.patch(`/pianos/${encodeURIComponent(pianoId)}`, changes, Piano);

export function useUpdatePiano() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePiano,
    meta: { handlesError: true },
    onSuccess: (piano) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: pianoKeys.detail(piano.id) }),
        queryClient.invalidateQueries({ queryKey: pianoKeys.lists() }),
      ]),
  });
}
