import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { wallClockOff, wallClockOn } from '../api/wall-actions';
import { wallKeys } from '../api/keys';
import type { ActionStamp } from '../lib/clock-grant';
import { grantedRuns, inQueueOrder, mergeReports, sendInOrder, waitingFor, type QueuedClockAction, type SendOutcome, type SendReport } from '../lib/clock-queue';
import { newIdempotencyKey } from '../lib/idempotency-key';
import { openQueueStore, type QueueStore } from '../lib/queue-store';
import { isGrantRefusal, isNetworkFailure, outcomeOfError } from '../lib/send-outcome';

export type NewClockAction = Pick<QueuedClockAction, 'kind' | 'technician' | 'task'>;

/** How often the screen tries again to send actions that carry a grant, while any wait. */
const RETRY_MS = 15_000;

/** How a waiting action proves who made it: the PIN just entered, or the grant kept with it. */
type Proof = { pin: string } | { grant: string };

async function sendOne(action: QueuedClockAction, proof: Proof, withTime: boolean): Promise<SendOutcome> {
  const base = { technicianId: action.technician.id, ...proof, idempotencyKey: action.key, ...(withTime ? { at: action.at } : {}) };
  try {
    if (action.kind === 'clock-on') await wallClockOn({ ...base, taskId: action.task!.id });
    else await wallClockOff(base);
    return { kind: 'sent' };
  } catch (error) {
    return outcomeOfError(error);
  }
}

interface Options {
  /** Told what came of actions the screen sent by itself (with their grants), when something did. */
  onSentByItself?: (report: SendReport) => void;
}

/**
 * Clock actions on this screen. Every action is written to the device first, then sent; one that
 * cannot be sent stays. Those made after a PIN check carry its grant and go by themselves, in
 * order with their original times and keys, as soon as the network returns (the online event,
 * and a retry every few seconds), whoever is at the screen. Those without a grant go the next
 * time their technician enters a PIN here. Sends run one at a time so nothing overtakes.
 */
export function useClockQueue({ onSentByItself }: Options = {}) {
  const queryClient = useQueryClient();
  const store = useRef<Promise<QueueStore> | null>(null);
  store.current ??= openQueueStore();
  const [actions, setActions] = useState<QueuedClockAction[]>([]);
  const [isDurable, setIsDurable] = useState(true);
  const chain = useRef<Promise<unknown>>(Promise.resolve());
  const lastSeq = useRef(0);
  const told = useRef(onSentByItself);
  told.current = onSentByItself;

  const reload = useCallback(async () => {
    const opened = await store.current!;
    const all = inQueueOrder(await opened.all());
    lastSeq.current = Math.max(lastSeq.current, ...all.map((a) => a.seq));
    setIsDurable(opened.isDurable);
    setActions(all);
    return all;
  }, []);

  /** Runs `work` after every earlier send has finished. */
  const serial = useCallback(<T,>(work: () => Promise<T>): Promise<T> => {
    const next = chain.current.then(work, work);
    chain.current = next.catch(() => undefined);
    return next;
  }, []);

  /** Removes a sent action, sets aside a refused one; a refused grant is dropped so the action waits for the PIN. */
  const settle = useCallback(async (action: QueuedClockAction, outcome: SendOutcome) => {
    const opened = await store.current!;
    if (outcome.kind === 'sent') await opened.remove(action.key);
    if (outcome.kind === 'refused') await opened.put({ ...action, state: 'refused', refusal: { code: outcome.code, message: outcome.message } });
    if (outcome.kind === 'stopped' && action.grant && isGrantRefusal(outcome.error)) await opened.put({ ...action, grant: undefined });
  }, []);

  const finish = useCallback(
    async (report: SendReport) => {
      await reload();
      if (report.sent.length > 0) void queryClient.invalidateQueries({ queryKey: wallKeys.technicians() });
      return report;
    },
    [queryClient, reload],
  );

  /** Not serialised: the technician's waiting actions in order, with the PIN just entered. */
  const sendWithPin = useCallback(
    async (technicianId: string, pin: string, freshKey?: string): Promise<SendReport> => {
      const waiting = waitingFor(await (await store.current!).all(), technicianId);
      return finish(await sendInOrder(waiting, (a) => sendOne(a, { pin }, a.key !== freshKey), settle));
    },
    [finish, settle],
  );

  /** Sends the technician's waiting actions in order with the PIN just entered. */
  const sendFor = useCallback((technicianId: string, pin: string) => serial(() => sendWithPin(technicianId, pin)), [serial, sendWithPin]);

  /**
   * Writes a new action to the device (with its grant, never its PIN), then sends it after any
   * earlier ones of the technician; answers the action and what came of the sending.
   */
  const submit = useCallback(
    (action: NewClockAction, stamp: ActionStamp, pin: string, nowMs = Date.now()) =>
      serial(async () => {
        const opened = await store.current!;
        lastSeq.current = Math.max(nowMs, lastSeq.current + 1);
        const queued: QueuedClockAction = { ...action, key: newIdempotencyKey(), seq: lastSeq.current, at: stamp.at, grant: stamp.grant, state: 'waiting' };
        await opened.put(queued);
        await reload();
        return { queued, report: await sendWithPin(action.technician.id, pin, queued.key) };
      }),
    [reload, serial, sendWithPin],
  );

  /**
   * Sends, without anyone at the screen, every action that carries a grant: each technician's in
   * order, stopping at one without a grant. Stops at once when the network is still down.
   */
  const sendGranted = useCallback(
    () =>
      serial(async () => {
        const reports: SendReport[] = [];
        for (const run of grantedRuns(await (await store.current!).all())) {
          const report = await sendInOrder(run, (a) => sendOne(a, { grant: a.grant!.token }, true), settle);
          reports.push(report);
          if (report.stoppedBy !== undefined && isNetworkFailure(report.stoppedBy)) break;
        }
        return finish(mergeReports(reports));
      }),
    [finish, serial, settle],
  );

  // Whatever panel is open: when the network returns, and every few seconds while granted actions wait.
  useEffect(() => {
    let isRunning = false;
    const trySend = async () => {
      if (isRunning || !navigator.onLine) return;
      isRunning = true;
      try {
        if (grantedRuns(await (await store.current!).all()).length === 0) return;
        const report = await sendGranted();
        if (report.sent.length > 0 || report.refused.length > 0) told.current?.(report);
      } catch {
        // The device store failed; the next try may do better.
      } finally {
        isRunning = false;
      }
    };
    void reload().then(trySend, () => undefined);
    const onOnline = () => void trySend();
    window.addEventListener('online', onOnline);
    const timer = setInterval(onOnline, RETRY_MS);
    return () => {
      window.removeEventListener('online', onOnline);
      clearInterval(timer);
    };
  }, [reload, sendGranted]);

  /** Drops an action the API refused, once someone has read why. */
  const dismiss = useCallback(
    async (key: string) => {
      await (await store.current!).remove(key);
      await reload();
    },
    [reload],
  );

  return { actions, isDurable, submit, sendFor, sendGranted, dismiss, reload };
}

export type ClockQueue = ReturnType<typeof useClockQueue>;
