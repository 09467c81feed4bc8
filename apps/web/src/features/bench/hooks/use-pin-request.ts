import { useCallback, useState } from 'react';

/**
 * Runs a request that carries a PIN outside the query client, so the PIN is never kept in a
 * mutation cache or anywhere else once the request has been sent. Answers the error, or null.
 */
export function usePinRequest<A extends unknown[]>(send: (...args: A) => Promise<unknown>) {
  const [isPending, setIsPending] = useState(false);
  const [error, setError] = useState<unknown>(null);

  const run = useCallback(
    async (...args: A): Promise<unknown> => {
      setIsPending(true);
      setError(null);
      try {
        await send(...args);
        return null;
      } catch (caught) {
        setError(caught);
        return caught ?? new Error('Request failed');
      } finally {
        setIsPending(false);
      }
    },
    [send],
  );

  return { run, isPending, error, clearError: () => setError(null) };
}
