import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me, type SignUpInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const signUp = (input: SignUpInput) => api.post('/auth/sign-up', input, Me);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    meta: { handlesError: true },
    onSuccess: (me) => {
      queryClient.removeQueries();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
