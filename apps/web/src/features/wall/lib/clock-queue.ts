import type { RunningEntry } from '@keybed/shared';

/**
 * A clock action made on this screen, kept on the device until the API has it. It holds no PIN:
 * each is sent, in order, with the PIN its technician enters at the screen.
 */
export interface QueuedClockAction {
  /** The idempotency key: the API counts an action once however often it is sent. */
  key: string;
  /** Order of creation on this screen; actions are sent in this order. */
  seq: number;
  kind: 'clock-on' | 'clock-off';
  technician: { id: string; name: string };
  /** For clock-on: the task, with its job, to show while waiting. */
  task?: { id: string; title: string; jobTitle: string } | undefined;
  /** When it really happened (ISO 8601); sent with every replay so the entry keeps its real time. */
  at: string;
  state: 'waiting' | 'refused';
  /** Why the API refused it, in its words. */
  refusal?: { code: string; message: string } | undefined;
}

export const inQueueOrder = (actions: readonly QueuedClockAction[]) => [...actions].sort((a, b) => a.seq - b.seq);

/** The technician's actions still to send, oldest first. */
export function waitingFor(actions: readonly QueuedClockAction[], technicianId: string): QueuedClockAction[] {
  return inQueueOrder(actions).filter((a) => a.state === 'waiting' && a.technician.id === technicianId);
}

/** What sending one action came to. */
export type SendOutcome =
  | { kind: 'sent' }
  /** The API will never take it (a done task, a time before the last entry…): set aside, shown. */
  | { kind: 'refused'; code: string; message: string }
  /** Not this action's fault (no network, wrong PIN, server trouble): it and those after it wait. */
  | { kind: 'stopped'; error: unknown };

export interface SendReport {
  sent: QueuedClockAction[];
  refused: QueuedClockAction[];
  /** Still waiting, in order, when a send stopped. */
  left: QueuedClockAction[];
  stoppedBy?: unknown;
}

/**
 * Sends actions one at a time in queue order. A refused action is set aside and the next is
 * tried (the API judges each on its own); a stopped send keeps it and every later one waiting,
 * so no action ever overtakes an earlier one.
 */
export async function sendInOrder(
  actions: readonly QueuedClockAction[],
  send: (action: QueuedClockAction) => Promise<SendOutcome>,
  settle: (action: QueuedClockAction, outcome: SendOutcome) => Promise<void> | void = () => {},
): Promise<SendReport> {
  const report: SendReport = { sent: [], refused: [], left: [] };
  const queue = inQueueOrder(actions);
  for (let i = 0; i < queue.length; i++) {
    const action = queue[i]!;
    const outcome = await send(action);
    await settle(action, outcome);
    if (outcome.kind === 'sent') report.sent.push(action);
    else if (outcome.kind === 'refused') report.refused.push({ ...action, state: 'refused', refusal: { code: outcome.code, message: outcome.message } });
    else return { ...report, left: queue.slice(i), stoppedBy: outcome.error };
  }
  return report;
}

/** What the wall shows a technician as on: the API's running entry, unless actions wait on this screen. */
export interface ShownRunning {
  taskTitle: string;
  jobTitle: string;
  startedAt: string;
  /** True when this comes from an action not yet sent. */
  isWaiting: boolean;
}

export function shownRunning(running: RunningEntry | null, waiting: readonly QueuedClockAction[]): ShownRunning | null {
  const last = inQueueOrder(waiting).at(-1);
  if (!last) return running && { taskTitle: running.task.title, jobTitle: running.job.title, startedAt: running.startedAt, isWaiting: false };
  if (last.kind === 'clock-off' || !last.task) return null;
  return { taskTitle: last.task.title, jobTitle: last.task.jobTitle, startedAt: last.at, isWaiting: true };
}
