import type { ReactNode } from 'react';
import type { WallPairing } from '@keybed/shared';

interface WallHeaderProps {
  pairing: WallPairing;
  now: number;
  isOnline: boolean;
  isLive: boolean;
  children?: ReactNode;
}

/** Workshop and screen name, the time in the workshop, whether the screen is live, and what waits. */
export function WallHeader({ pairing, now, isOnline, isLive, children }: WallHeaderProps) {
  const clock = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone: pairing.workshop.timeZone }).format(now);
  const state = !isOnline ? 'Offline' : isLive ? 'Live' : 'Reconnecting…';
  return (
    <header className="flex flex-wrap items-center gap-x-8 gap-y-2 bg-ink px-6 py-3 text-paper lg:px-10">
      <div className="min-w-0">
        <p className="text-wall-sm font-bold">{pairing.workshop.name}</p>
        <p className="text-xl text-graphite-300">{pairing.device.name}</p>
      </div>
      <div className="ml-auto flex flex-wrap items-center gap-x-6 gap-y-2">
        {children}
        <p className="text-xl">
          <span aria-hidden="true" className={`mr-2 inline-block size-4 rounded-full ${isOnline && isLive ? 'bg-felt-light' : 'bg-graphite-400'}`} />
          {state}
        </p>
        <p className="text-wall-lg font-bold tabular-figures">
          <span className="sr-only">Time now </span>
          {clock}
        </p>
      </div>
    </header>
  );
}
