import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequestInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

export const requestPasswordReset = (input: PasswordResetRequestInput) => api.post('/auth/password-reset', input);

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset, meta: { handlesError: true } });
}
