import { describe, expect, it } from 'vitest';
import type { QueuedClockAction } from './clock-queue';
import { savedText, sentByItselfText, waitingReportText } from './wall-notice';

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
  it('when an action is kept with a grant, then it says it goes by itself when the network is back', () => {
    expect(savedText('Priya Natarajan', 'Priya Natarajan is on Hang new hammers.', true)).toBe(
      'Saved on this screen: Priya Natarajan is on Hang new hammers. It will be sent by itself when the network is back.',
    );
  });

  it('when an action is kept without a grant, then it waits for the technician’s PIN, named by first name', () => {
    expect(savedText('Priya Natarajan', 'Priya Natarajan clocked off.', false)).toBe(
      'Saved on this screen: Priya Natarajan clocked off. It will be sent the next time Priya enters a PIN here with the network back.',
    );
  });
});

describe('sentByItselfText', () => {
  const onHang: QueuedClockAction = { ...action('a'), kind: 'clock-on', task: { id: 't1', title: 'Hang new hammers', jobTitle: 'Salon grand: new hammers' } };
  const declanOff: QueuedClockAction = { ...action('b'), technician: { id: 'declan', name: 'Declan Moss' } };

  it('when nothing was sent or refused, then there is nothing to say', () => {
    expect(sentByItselfText({ sent: [], refused: [], left: [onHang] })).toBeUndefined();
  });

  it('when actions went by themselves, then each is named with its technician', () => {
    expect(sentByItselfText({ sent: [onHang, declanOff], refused: [], left: [] })).toBe('Sent now the network is back: Priya on Hang new hammers, Declan clocked off.');
  });

  it('when one was refused, then the API’s reason is said for that technician', () => {
    const refused = { ...declanOff, state: 'refused' as const, refusal: { code: 'not_running', message: 'Declan Moss is not clocked on to anything.' } };
    expect(sentByItselfText({ sent: [], refused: [refused], left: [] })).toBe('Not accepted for Declan: Declan Moss is not clocked on to anything.');
  });
});
