import { describe, expect, it } from 'vitest';
import type { QueuedClockAction } from './clock-queue';
import { savedText, waitingReportText } from './wall-notice';

const action = (key: string): QueuedClockAction => ({
  key,
  seq: 1,
  kind: 'clock-off',
  technician: { id: 'priya', name: 'Priya Natarajan' },
  at: '2026-03-02T12:30:00Z',
  state: 'waiting',
});

describe('waitingReportText', () => {
  it('when nothing was waiting, then there is nothing to say', () => {
    expect(waitingReportText({ sent: [], refused: [], left: [] })).toBeUndefined();
  });

  it('when some were sent and one refused, then both are said with the API’s reason', () => {
    const refused = { ...action('b'), state: 'refused' as const, refusal: { code: 'not_running', message: 'Priya Natarajan is not clocked on to anything.' } };
    expect(waitingReportText({ sent: [action('a'), action('c')], refused: [refused], left: [] })).toBe(
      '2 waiting actions sent. Not accepted: Priya Natarajan is not clocked on to anything.',
    );
  });

  it('when sending stopped, then it says how many still wait', () => {
    expect(waitingReportText({ sent: [], refused: [], left: [action('a')] })).toBe('1 action is still waiting.');
  });
});

describe('savedText', () => {
  it('when an action is kept on the screen, then it names the technician by first name', () => {
    expect(savedText('Priya Natarajan', 'Priya Natarajan clocked off.')).toBe(
      'Saved on this screen: Priya Natarajan clocked off. It will be sent the next time Priya enters a PIN here with the network back.',
    );
  });
});
