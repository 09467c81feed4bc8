import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { wallClockOff, wallClockOn } from '../api/wall-actions';
import { wallKeys } from '../api/keys';
import { inQueueOrder, sendInOrder, waitingFor, type QueuedClockAction, type SendOutcome, type SendReport } from '../lib/clock-queue';
import { newIdempotencyKey } from '../lib/idempotency-key';
import { openQueueStore, type QueueStore } from '../lib/queue-store';
import { outcomeOfError } from '../lib/send-outcome';

export type NewClockAction = Pick<QueuedClockAction, 'kind' | 'technician' | 'task'>;

/**
 * Clock actions on this screen. Every action is written to the device first, then sent; one that
 * cannot be sent stays, and goes in order (with its original time and key) the next time its
 * technician enters their PIN here. Sends run one at a time so nothing overtakes.
 */
export function useClockQueue() {
  const queryClient = useQueryClient();
  const store = useRef<Promise<QueueStore> | null>(null);
  store.current ??= openQueueStore();
  const [actions, setActions] = useState<QueuedClockAction[]>([]);
  const [isDurable, setIsDurable] = useState(true);
  const chain = useRef<Promise<unknown>>(Promise.resolve());
  const lastSeq = useRef(0);

  const reload = useCallback(async () => {
    const opened = await store.current!;
    const all = inQueueOrder(await opened.all());
    lastSeq.current = Math.max(lastSeq.current, ...all.map((a) => a.seq));
    setIsDurable(opened.isDurable);
    setActions(all);
  }, []);

  useEffect(() => {
    void reload();
  }, [reload]);

  /** Runs `work` after every earlier send has finished. */
  const serial = useCallback(<T,>(work: () => Promise<T>): Promise<T> => {
    const next = chain.current.then(work, work);
    chain.current = next.catch(() => undefined);
    return next;
  }, []);

  /** Sends the technician's waiting actions in order with the PIN just entered; `freshKey` is one made this moment. */
  const sendFor = useCallback(
    (technicianId: string, pin: string, freshKey?: string): Promise<SendReport> =>
      serial(async () => {
        const opened = await store.current!;
        const send = async (action: QueuedClockAction): Promise<SendOutcome> => {
          const base = { technicianId, pin, idempotencyKey: action.key, ...(action.key === freshKey ? {} : { at: action.at }) };
          try {
            if (action.kind === 'clock-on') await wallClockOn({ ...base, taskId: action.task!.id });
            else await wallClockOff(base);
            return { kind: 'sent' };
          } catch (error) {
            return outcomeOfError(error);
          }
        };
        const settle = async (action: QueuedClockAction, outcome: SendOutcome) => {
          if (outcome.kind === 'sent') await opened.remove(action.key);
          if (outcome.kind === 'refused') await opened.put({ ...action, state: 'refused', refusal: { code: outcome.code, message: outcome.message } });
        };
        const report = await sendInOrder(waitingFor(await opened.all(), technicianId), send, settle);
        await reload();
        if (report.sent.length > 0) void queryClient.invalidateQueries({ queryKey: wallKeys.technicians() });
        return report;
      }),
    [queryClient, reload, serial],
  );

  /** Writes a new action to the device (never its PIN) and answers it. */
  const record = useCallback(
    async (action: NewClockAction, nowMs = Date.now()): Promise<QueuedClockAction> => {
      const opened = await store.current!;
      lastSeq.current = Math.max(nowMs, lastSeq.current + 1);
      const queued: QueuedClockAction = { ...action, key: newIdempotencyKey(), seq: lastSeq.current, at: new Date(nowMs).toISOString(), state: 'waiting' };
      await opened.put(queued);
      await reload();
      return queued;
    },
    [reload],
  );

  /** Drops an action the API refused, once someone has read why. */
  const dismiss = useCallback(
    async (key: string) => {
      await (await store.current!).remove(key);
      await reload();
    },
    [reload],
  );

  return { actions, isDurable, record, sendFor, dismiss, reload };
}

export type ClockQueue = ReturnType<typeof useClockQueue>;
