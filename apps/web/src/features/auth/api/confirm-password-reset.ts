import { useMutation } from '@tanstack/react-query';
import type { PasswordResetConfirmInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

export const confirmPasswordReset = (input: PasswordResetConfirmInput) =>
  api.post('/auth/password-reset/confirm', input);

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset, meta: { handlesError: true } });
}
