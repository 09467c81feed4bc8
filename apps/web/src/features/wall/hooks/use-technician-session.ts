import { useCallback, useEffect, useRef, useState } from 'react';
import type { WallTask, WallTechnician, WallTechnicianTasks } from '@keybed/shared';
import { isApiError } from '@/lib/api-client';
import { verifyPin, wallLogPart } from '../api/wall-actions';
import { holdGrant, stampAction, type HeldGrant } from '../lib/clock-grant';
import { waitingFor } from '../lib/clock-queue';
import { isWhoRefusal, loggedText, partRefusalText, type PartUse } from '../lib/part-messages';
import { isNetworkFailure } from '../lib/send-outcome';
import { lockedMinutes, lockedText, noPinText, wallErrorText } from '../lib/wall-messages';
import { savedText, waitingReportText, type WallNotice } from '../lib/wall-notice';
import type { ClockQueue, NewClockAction } from './use-clock-queue';

export type SessionStep =
  /** Nothing to enter: no PIN yet, or locked. */
  | { name: 'blocked'; text: string }
  | { name: 'pin'; message?: string | undefined }
  /** `data` is null when offline and this screen has no task list for them yet. */
  | { name: 'tasks'; data: WallTechnicianTasks | null; isOffline: boolean; note?: string | undefined };

/** What came of logging parts used: recorded, refused (why, in plain words), or the turn went back to the PIN. */
export type LogPartOutcome = { kind: 'logged' } | { kind: 'refused'; text: string } | { kind: 'ended' };

/** Refusals that leave nothing to try on the pad. */
const BLOCKING = new Set(['pin_locked', 'pin_not_set', 'wall_pin_limit']);
const RETRY_MS = 10_000;

interface Options {
  technician: WallTechnician;
  queue: ClockQueue;
  /** The last task list this screen saw for them (memory only), for when the network is down. */
  cachedTasks: WallTechnicianTasks | undefined;
  onTasksLoaded: (data: WallTechnicianTasks) => void;
  onClose: (notice?: WallNotice) => void;
  onUnpaired: () => void;
}

function firstStep(technician: WallTechnician): SessionStep {
  if (!technician.hasPin) return { name: 'blocked', text: noPinText(technician.name) };
  if (technician.lockedUntil && Date.parse(technician.lockedUntil) > Date.now()) {
    return { name: 'blocked', text: lockedText(lockedMinutes(technician.lockedUntil, Date.now())) };
  }
  return { name: 'pin' };
}

/**
 * One technician's turn at the wall. The PIN they enter is held in memory only while their
 * context is open and dropped when it closes; the offline queue never stores it. A right PIN
 * also brings a clock grant: an action made in the next few minutes is kept with that grant
 * (never the PIN), so the screen can send it by itself when the network returns.
 */
export function useTechnicianSession({ technician, queue, cachedTasks, onTasksLoaded, onClose, onUnpaired }: Options) {
  const [step, setStep] = useState<SessionStep>(() => firstStep(technician));
  const [isBusy, setIsBusy] = useState(false);
  const pin = useRef<string | null>(null);
  const grant = useRef<HeldGrant | null>(null);
  const latest = useRef({ queue, step, isBusy });
  latest.current = { queue, step, isBusy };
  const { name } = technician;

  useEffect(
    () => () => {
      pin.current = null;
      grant.current = null;
    },
    [],
  );

  const failed = useCallback(
    (error: unknown) => {
      if (isApiError(error) && error.code === 'wall_not_paired') return onUnpaired();
      pin.current = null;
      grant.current = null;
      if (isApiError(error) && BLOCKING.has(error.code)) return setStep({ name: 'blocked', text: wallErrorText(error, name) });
      setStep({ name: 'pin', message: wallErrorText(error, name) });
    },
    [name, onUnpaired],
  );

  /** Checks the PIN; sends anything of theirs waiting on this screen; shows their tasks. */
  const check = useCallback(
    async (entered: string) => {
      setIsBusy(true);
      try {
        const checked = await verifyPin(technician.id, entered);
        let { grant: issued, ...data } = checked;
        pin.current = entered;
        let note: string | undefined;
        if (waitingFor(latest.current.queue.actions, technician.id).length > 0) {
          const report = await latest.current.queue.sendFor(technician.id, entered);
          note = waitingReportText(report);
          if (report.sent.length > 0) ({ grant: issued, ...data } = await verifyPin(technician.id, entered).catch(() => checked));
        }
        grant.current = holdGrant(issued, Date.now());
        onTasksLoaded(data);
        setStep({ name: 'tasks', data, isOffline: false, note });
      } catch (error) {
        if (!isNetworkFailure(error)) return failed(error);
        // The PIN cannot be checked now, so there is no grant: actions wait for the PIN to be checked.
        pin.current = entered;
        grant.current = null;
        setStep({ name: 'tasks', data: cachedTasks ?? null, isOffline: true });
      } finally {
        setIsBusy(false);
      }
    },
    [technician.id, cachedTasks, onTasksLoaded, failed],
  );

  /** Writes the action to the device, sends it (after any earlier ones), and closes or explains. */
  const act = useCallback(
    async (action: NewClockAction, doneText: string) => {
      if (!pin.current) return setStep({ name: 'pin' });
      setIsBusy(true);
      let queued, report;
      try {
        ({ queued, report } = await queue.submit(action, stampAction(grant.current, Date.now()), pin.current));
      } catch {
        return onClose({ tone: 'problem', text: 'This screen could not keep that action. Try again.' });
      } finally {
        setIsBusy(false);
      }
      if (report.sent.some((a) => a.key === queued.key)) return onClose({ tone: 'done', text: doneText });
      const refused = report.refused.find((a) => a.key === queued.key);
      if (refused) {
        // They are here to read why; it need not wait on the screen.
        await queue.dismiss(queued.key);
        return setStep((s) => (s.name === 'tasks' ? { ...s, note: refused.refusal?.message } : s));
      }
      const error = report.stoppedBy;
      if (isNetworkFailure(error) || !isApiError(error) || error.status >= 500) return onClose({ tone: 'saved', text: savedText(name, doneText, queued.grant !== undefined) });
      failed(error);
    },
    [queue, technician.id, name, onClose, failed],
  );

  /**
   * Logs parts used with the PIN held for this turn (parts are never kept on the screen to send
   * later); a logged part is said in the panel's status line and the turn stays open.
   */
  const logPart = useCallback(
    async (use: PartUse): Promise<LogPartOutcome> => {
      if (!pin.current) {
        setStep({ name: 'pin' });
        return { kind: 'ended' };
      }
      setIsBusy(true);
      try {
        await wallLogPart({ technicianId: technician.id, pin: pin.current, taskId: use.task.id, partId: use.part.id, quantityMilli: use.quantityMilli });
        setStep((s) => (s.name === 'tasks' ? { ...s, note: loggedText(use) } : s));
        return { kind: 'logged' };
      } catch (error) {
        if (!isWhoRefusal(error)) return { kind: 'refused', text: partRefusalText(error, use.part) };
        failed(error);
        return { kind: 'ended' };
      } finally {
        setIsBusy(false);
      }
    },
    [technician.id, failed],
  );

  const clockOn = (task: WallTask) =>
    act({ kind: 'clock-on', technician: { id: technician.id, name }, task: { id: task.id, title: task.title, jobTitle: task.job.title } }, `${name} is on ${task.title}.`);
  const clockOff = () => act({ kind: 'clock-off', technician: { id: technician.id, name } }, `${name} clocked off.`);

  // While their context is open: when the network returns, check the PIN and send what waits.
  useEffect(() => {
    const retry = () => {
      const { step: current, isBusy: busy, queue: q } = latest.current;
      if (busy || !pin.current) return;
      if (current.name === 'tasks' && current.isOffline) return void check(pin.current);
      if (waitingFor(q.actions, technician.id).length > 0) void q.sendFor(technician.id, pin.current);
    };
    window.addEventListener('online', retry);
    const timer = setInterval(retry, RETRY_MS);
    return () => {
      window.removeEventListener('online', retry);
      clearInterval(timer);
    };
  }, [check, technician.id]);

  return { step, isBusy, check, clockOn, clockOff, logPart };
}
