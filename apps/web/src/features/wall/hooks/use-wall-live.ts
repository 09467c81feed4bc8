import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { openLiveStream } from '@/lib/live-stream';
import { wallKeys } from '../api/keys';

/**
 * The screen's own live event stream (its device session may not use the members' one). Clock
 * changes anywhere refresh who is on what, stock changes the parts to log; answers whether the
 * stream is open, so the screen can poll more often while it is not.
 */
export function useWallLive(isEnabled: boolean): boolean {
  const queryClient = useQueryClient();
  const [isLive, setIsLive] = useState(false);

  useEffect(() => {
    if (!isEnabled) return;
    const refresh = () => void queryClient.invalidateQueries({ queryKey: wallKeys.technicians() });

    const close = openLiveStream('/api/wall/events', {
      onOpen: () => {
        setIsLive(true);
        refresh();
      },
      onEvent: (event) => {
        if (event.kind === 'time.changed' || event.kind === 'task.changed') refresh();
        if (event.kind === 'part.changed') void queryClient.invalidateQueries({ queryKey: wallKeys.parts() });
      },
      onDown: () => setIsLive(false),
    });
    return () => {
      close();
      setIsLive(false);
    };
  }, [isEnabled, queryClient]);

  return isLive;
}
