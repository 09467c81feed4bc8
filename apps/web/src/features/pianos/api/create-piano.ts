import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Piano, type CreatePianoInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { pianoKeys } from './keys';

export const createPiano = (input: CreatePianoInput) => api.post('/pianos', input, Piano);

/** The client's page lists their pianos; it refreshes from the live event the API sends. */
export function useCreatePiano() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPiano,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pianoKeys.lists() }),
  });
}
