import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me, type SignInInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const signIn = (input: SignInInput) => api.post('/auth/sign-in', input, Me);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    meta: { handlesError: true },
    onSuccess: (me) => {
      // A different member may have used this browser before: drop their cached data.
      queryClient.removeQueries();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
