import { useCallback, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { WallPairing, WallTechnicianTasks } from '@keybed/shared';
import { isApiError } from '@/lib/api-client';
import { describeError } from '@/lib/error-messages';
import { useNow } from '@/lib/use-now';
import { useWallSession } from '../api/get-wall-session';
import { useWallTechnicians } from '../api/get-wall-technicians';
import { wallKeys } from '../api/keys';
import { useClockQueue } from '../hooks/use-clock-queue';
import { useOnline } from '../hooks/use-online';
import { useWallLive } from '../hooks/use-wall-live';
import { shownRunning, waitingFor, type SendReport } from '../lib/clock-queue';
import { sentByItselfText, type WallNotice } from '../lib/wall-notice';
import { TechnicianPanel } from './technician-panel';
import { TechnicianTile } from './technician-tile';
import { WaitingActions } from './waiting-actions';
import { WallHeader } from './wall-header';
import { WallNoticeBar } from './wall-notice-bar';
import { WallNotPaired } from './wall-not-paired';

const isNotPaired = (error: unknown) => isApiError(error) && error.code === 'wall_not_paired';

function WallMessage({ title, children }: { title: string; children?: string }) {
  return (
    <main className="flex min-h-dvh items-center justify-center bg-paper p-8 text-ink">
      <div role="status" className="max-w-3xl text-center">
        <h1 className="text-wall font-bold">{title}</h1>
        {children && <p className="mt-4 text-wall-sm">{children}</p>}
      </div>
    </main>
  );
}

/** The home view: everyone and what they are on, live; tapping a name opens their turn. */
function PairedWall({ pairing }: { pairing: WallPairing }) {
  const queryClient = useQueryClient();
  const isOnline = useOnline();
  const isLive = useWallLive(true);
  const technicians = useWallTechnicians(isLive ? 60_000 : 10_000);
  const now = useNow(1_000);
  const [openId, setOpenId] = useState<string | null>(null);
  const [notice, setNotice] = useState<WallNotice | null>(null);
  const sentByItself = useCallback((report: SendReport) => {
    const text = sentByItselfText(report);
    if (text) setNotice({ tone: report.refused.length > 0 ? 'problem' : 'done', text });
  }, []);
  const queue = useClockQueue({ onSentByItself: sentByItself });
  const taskCache = useRef(new Map<string, WallTechnicianTasks>());

  // A PIN lock or unlock sends no live event: read everyone afresh whenever a turn ends.
  const close = useCallback(
    (next?: WallNotice) => {
      setOpenId(null);
      if (next) setNotice(next);
      void queryClient.invalidateQueries({ queryKey: wallKeys.technicians() });
    },
    [queryClient],
  );
  const unpaired = useCallback(() => void queryClient.invalidateQueries({ queryKey: wallKeys.session() }), [queryClient]);
  const cacheTasks = useCallback((data: WallTechnicianTasks) => void taskCache.current.set(data.technician.id, data), []);
  const clearNotice = useCallback(() => setNotice(null), []);

  if (isNotPaired(technicians.error)) return <WallNotPaired />;
  const open = technicians.data?.find((t) => t.id === openId);
  return (
    <div className="flex min-h-dvh flex-col bg-paper text-ink">
      {/* While a technician's panel is open, the home view behind it can be neither reached nor read. */}
      <div inert={open !== undefined} className="flex flex-1 flex-col">
        <WallHeader pairing={pairing} now={now} isOnline={isOnline} isLive={isLive}>
          <WaitingActions actions={queue.actions} timeZone={pairing.workshop.timeZone} isDurable={queue.isDurable} onDismiss={(key) => void queue.dismiss(key)} />
        </WallHeader>
        {!isOnline && (
          <p role="status" className="bg-graphite-700 px-10 py-3 text-xl font-semibold text-white">
            No network. Clock actions are kept on this screen and sent when the network is back.
          </p>
        )}
        <main className="flex-1 px-6 py-6 pb-32 lg:px-10">
          <h1 className="mb-4 text-wall-sm font-bold">Who is working · tap your name</h1>
          {technicians.isPending ? (
            <p role="status" className="text-wall-sm">Loading who is working…</p>
          ) : technicians.isError && !technicians.data ? (
            <p role="alert" className="text-wall-sm">{describeError(technicians.error).title} The screen keeps trying.</p>
          ) : technicians.data.length === 0 ? (
            <p className="text-wall-sm">Nobody clocks on here yet. Technicians appear once they join the workshop.</p>
          ) : (
            <ul aria-label="Technicians" className="grid grid-cols-[repeat(auto-fit,minmax(min(26rem,100%),1fr))] gap-5">
              {technicians.data.map((t) => {
                const waiting = waitingFor(queue.actions, t.id);
                return (
                  <li key={t.id} className="flex">
                    <TechnicianTile technician={t} timeZone={pairing.workshop.timeZone} shown={shownRunning(t.running, waiting)} waitingCount={waiting.length} now={now} onOpen={() => setOpenId(t.id)} />
                  </li>
                );
              })}
            </ul>
          )}
        </main>
      </div>
      <WallNoticeBar notice={notice} onGone={clearNotice} />
      {open && (
        <TechnicianPanel
          key={open.id}
          technician={open}
          queue={queue}
          cachedTasks={taskCache.current.get(open.id)}
          onTasksLoaded={cacheTasks}
          onClose={close}
          onUnpaired={unpaired}
        />
      )}
    </div>
  );
}

/** The wall screen: paired browsers show the home view; others say how to pair. */
export function WallScreen() {
  const session = useWallSession();
  if (isNotPaired(session.error)) return <WallNotPaired />;
  // A failed renewal keeps the pairing it had: the screen carries on.
  if (session.data) return <PairedWall pairing={session.data} />;
  if (session.isPending) return <WallMessage title="Starting the wall screen…" />;
  return <WallMessage title={describeError(session.error).title}>Reload the page to try again.</WallMessage>;
}
