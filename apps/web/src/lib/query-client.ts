import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';
import { describeError, errorReference } from './error-messages';
import { showToast } from './toast';

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: {
      /** The mutation shows its own errors (e.g. on form fields), so no global toast. */
      handlesError?: boolean;
    };
  }
}

const MAX_RETRIES = 2;

const isSignedOut = (error: unknown) => isApiError(error) && error.code === 'unauthenticated';

interface QueryClientOptions {
  /** Called when any request finds the session gone; sends the member to sign-in. */
  onUnauthenticated: () => void;
}

export function createQueryClient({ onUnauthenticated }: QueryClientOptions): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (isSignedOut(error)) onUnauthenticated();
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (isSignedOut(error)) return onUnauthenticated();
        if (mutation.meta?.handlesError) return;
        const { title, action } = describeError(error);
        showToast('error', `${title} ${action}`, errorReference(error));
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // A 4xx will not change by asking again; network blips and 5xx may.
        retry: (failureCount, error) =>
          failureCount < MAX_RETRIES && !(isApiError(error) && error.status >= 400 && error.status < 500),
      },
      mutations: { retry: false },
    },
  });
}
