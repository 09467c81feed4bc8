import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ClientDepositResult, ClientPage, type ClientAcceptInput, type ClientDeclineInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { clientPageKeys } from './keys';

const base = (token: string) => `/client/${encodeURIComponent(token)}`;

export const acceptEstimate = (token: string, input: ClientAcceptInput) => api.post(`${base(token)}/accept`, input, ClientPage);
export const declineEstimate = (token: string, input: ClientDeclineInput) => api.post(`${base(token)}/decline`, input, ClientPage);
export const startDeposit = (token: string) => api.post(`${base(token)}/deposit`, {}, ClientDepositResult);

/** The reply is the page as it now stands; a refusal (already answered, replaced) reloads it. */
function useAnswer<I>(token: string, send: (token: string, input: I) => Promise<ClientPage>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: I) => send(token, input),
    meta: { handlesError: true },
    onSuccess: (page) => queryClient.setQueryData(clientPageKeys.detail(token), page),
    onError: () => queryClient.invalidateQueries({ queryKey: clientPageKeys.detail(token) }),
  });
}

export const useAcceptEstimate = (token: string) => useAnswer(token, acceptEstimate);
export const useDeclineEstimate = (token: string) => useAnswer(token, declineEstimate);

/** Starts the card payment; the caller goes to the payment page it names. */
export function useStartDeposit(token: string) {
  return useMutation({ mutationFn: () => startDeposit(token), meta: { handlesError: true } });
}
