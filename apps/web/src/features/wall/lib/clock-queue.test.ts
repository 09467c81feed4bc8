import { describe, expect, it } from 'vitest';
import type { RunningEntry } from '@keybed/shared';
import { grantedRuns, mergeReports, sendInOrder, shownRunning, waitingFor, type QueuedClockAction, type SendOutcome } from './clock-queue';

const priya = { id: 'priya', name: 'Priya Natarajan' };
const declan = { id: 'declan', name: 'Declan Moss' };

let seq = 0;
const action = (technician: typeof priya, kind: QueuedClockAction['kind'], at: string, taskTitle?: string): QueuedClockAction => ({
  key: `offline-${++seq}`,
  seq,
  kind,
  technician,
  task: taskTitle ? { id: taskTitle, title: taskTitle, jobTitle: 'Salon grand: new hammers' } : undefined,
  at,
  state: 'waiting',
});

const onRebush = action(priya, 'clock-on', '2026-03-02T08:02:00Z', 'Rebush keys');
const onHang = action(priya, 'clock-on', '2026-03-02T10:15:00Z', 'Hang new hammers');
const offPriya = action(priya, 'clock-off', '2026-03-02T12:30:00Z');
const onDeclan = action(declan, 'clock-on', '2026-03-02T09:00:00Z', 'Pitch raise');

describe('waitingFor', () => {
  it('when actions of several technicians wait, then one technician’s come back oldest first, whatever order they were stored in', () => {
    expect(waitingFor([offPriya, onDeclan, onHang, onRebush], 'priya').map((a) => a.key)).toEqual([onRebush.key, onHang.key, offPriya.key]);
  });

  it('when an action was refused, then it no longer waits', () => {
    expect(waitingFor([{ ...onRebush, state: 'refused' }, onHang], 'priya').map((a) => a.key)).toEqual([onHang.key]);
  });
});

describe('grantedRuns', () => {
  const grant = { token: 'grant-token-for-priya-at-the-bench-room-screen', expiresAt: '2026-03-03T08:00:00Z' };
  const granted = (a: QueuedClockAction): QueuedClockAction => ({ ...a, grant });

  it('when every waiting action carries a grant, then each technician’s go together, oldest first', () => {
    const runs = grantedRuns([granted(offPriya), granted(onDeclan), granted(onRebush), granted(onHang)]);
    expect(runs.map((run) => run.map((a) => a.key))).toEqual([[onRebush.key, onHang.key, offPriya.key], [onDeclan.key]]);
  });

  it('when a technician’s action has no grant, then it and every later one of theirs wait for the PIN; others still go', () => {
    const runs = grantedRuns([granted(onRebush), onHang, granted(offPriya), granted(onDeclan)]);
    expect(runs.map((run) => run.map((a) => a.key))).toEqual([[onRebush.key], [onDeclan.key]]);
  });

  it('when a technician’s oldest action has no grant, or an action was refused, then nothing of theirs goes by itself', () => {
    expect(grantedRuns([onRebush, granted(onHang)])).toEqual([]);
    expect(grantedRuns([{ ...granted(onRebush), state: 'refused' }])).toEqual([]);
  });
});

describe('mergeReports', () => {
  it('when several technicians’ runs were sent, then one report holds them all and the first reason a send stopped', () => {
    const stop = new TypeError('Failed to fetch');
    const merged = mergeReports([
      { sent: [onRebush], refused: [], left: [] },
      { sent: [], refused: [], left: [onDeclan], stoppedBy: stop },
    ]);
    expect(merged).toEqual({ sent: [onRebush], refused: [], left: [onDeclan], stoppedBy: stop });
    expect(mergeReports([])).toEqual({ sent: [], refused: [], left: [] });
  });
});

describe('sendInOrder', () => {
  it('when every send succeeds, then they go oldest first', async () => {
    const order: string[] = [];
    const report = await sendInOrder([offPriya, onRebush, onHang], async (a) => {
      order.push(a.key);
      return { kind: 'sent' };
    });
    expect(order).toEqual([onRebush.key, onHang.key, offPriya.key]);
    expect(report.sent).toHaveLength(3);
    expect(report.left).toEqual([]);
  });

  it('when the network drops midway, then that action and every later one stay waiting in order', async () => {
    const outcomes: SendOutcome[] = [{ kind: 'sent' }, { kind: 'stopped', error: new TypeError('Failed to fetch') }];
    const tried: string[] = [];
    const report = await sendInOrder([onRebush, onHang, offPriya], async (a) => {
      tried.push(a.key);
      return outcomes.shift()!;
    });
    expect(tried).toEqual([onRebush.key, onHang.key]);
    expect(report.sent.map((a) => a.key)).toEqual([onRebush.key]);
    expect(report.left.map((a) => a.key)).toEqual([onHang.key, offPriya.key]);
  });

  it('when the API refuses one action, then it is set aside with the reason and the next is still sent', async () => {
    const report = await sendInOrder([onRebush, offPriya], async (a) =>
      a === onRebush ? { kind: 'refused', code: 'task_not_open', message: '“Rebush keys” is done.' } : { kind: 'sent' },
    );
    expect(report.refused).toEqual([{ ...onRebush, state: 'refused', refusal: { code: 'task_not_open', message: '“Rebush keys” is done.' } }]);
    expect(report.sent.map((a) => a.key)).toEqual([offPriya.key]);
  });

  it('when each send settles, then the store hears of it before the next is sent', async () => {
    const log: string[] = [];
    await sendInOrder(
      [onRebush, onHang],
      async (a) => {
        log.push(`send ${a.key}`);
        return { kind: 'sent' };
      },
      (a) => {
        log.push(`settle ${a.key}`);
      },
    );
    expect(log).toEqual([`send ${onRebush.key}`, `settle ${onRebush.key}`, `send ${onHang.key}`, `settle ${onHang.key}`]);
  });
});

describe('shownRunning', () => {
  const running: RunningEntry = {
    entryId: 'e1',
    technician: priya,
    task: { id: 't3', title: 'Rebush keys' },
    job: { id: 'j1', title: 'Salon grand: new hammers' },
    startedAt: '2026-03-02T08:00:00Z',
  };

  it('when nothing waits, then the API’s running entry shows', () => {
    expect(shownRunning(running, [])).toEqual({ taskTitle: 'Rebush keys', jobTitle: 'Salon grand: new hammers', startedAt: running.startedAt, isWaiting: false });
    expect(shownRunning(null, [])).toBeNull();
  });

  it('when a clock-on waits, then the waiting task shows from its own time', () => {
    expect(shownRunning(running, [onHang])).toMatchObject({ taskTitle: 'Hang new hammers', startedAt: onHang.at, isWaiting: true });
  });

  it('when the last waiting action is a clock-off, then nothing shows as running', () => {
    expect(shownRunning(running, [onHang, offPriya])).toBeNull();
  });
});
