import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const signOut = () => api.post('/auth/sign-out');

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Nothing from this session may linger for the next person at this screen.
    onSuccess: () => queryClient.removeQueries(),
  });
}
