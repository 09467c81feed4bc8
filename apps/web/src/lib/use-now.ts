import { useEffect, useState } from 'react';

/** The current time in epoch ms, refreshed every `everyMs` (for ticking timers and countdowns). */
export function useNow(everyMs = 1_000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs]);
  return now;
}
