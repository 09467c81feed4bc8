import type { RunningEntry } from '@keybed/shared';
import type { StoredGrant } from './clock-grant';

/**
 * A clock action made on this screen, kept on the device until the API has it. It holds no PIN.
 * One made after a PIN check here carries that check's clock grant and is sent, in order, as soon
 * as the network allows; one without a grant waits for its technician to enter a PIN here.
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
  /** The clock grant that lets the screen send it without the PIN; absent, it waits for the PIN. */
  grant?: StoredGrant | undefined;
  state: 'waiting' | 'refused';
  /** Why the API refused it, in its words. */
  refusal?: { code: string; message: string } | undefined;
}

export const inQueueOrder = (actions: readonly QueuedClockAction[]) => [...actions].sort((a, b) => a.seq - b.seq);

/** The technician's actions still to send, oldest first. */
export function waitingFor(actions: readonly QueuedClockAction[], technicianId: string): QueuedClockAction[] {
  return inQueueOrder(actions).filter((a) => a.state === 'waiting' && a.technician.id === technicianId);
}

/**
 * What the screen can send now without anyone at it: for each technician, their waiting actions
 * in order up to the first one without a grant (that one, and all after it, wait for the PIN, so
 * nothing overtakes it). Technicians are independent of each other.
 */
export function grantedRuns(actions: readonly QueuedClockAction[]): QueuedClockAction[][] {
  const byTechnician = new Map<string, QueuedClockAction[]>();
  for (const action of inQueueOrder(actions)) {
    if (action.state !== 'waiting') continue;
    const run = byTechnician.get(action.technician.id) ?? [];
    byTechnician.set(action.technician.id, run);
    run.push(action);
  }
  return [...byTechnician.values()].map((run) => run.slice(0, firstIndex(run, (a) => !a.grant))).filter((run) => run.length > 0);
}

function firstIndex<T>(items: readonly T[], test: (item: T) => boolean): number {
  const i = items.findIndex(test);
  return i === -1 ? items.length : i;
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

/** Several reports (one per technician's run) as one. */
export function mergeReports(reports: readonly SendReport[]): SendReport {
  const merged: SendReport = { sent: reports.flatMap((r) => r.sent), refused: reports.flatMap((r) => r.refused), left: reports.flatMap((r) => r.left) };
  const stopped = reports.find((r) => r.stoppedBy !== undefined);
  return stopped ? { ...merged, stoppedBy: stopped.stoppedBy } : merged;
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
