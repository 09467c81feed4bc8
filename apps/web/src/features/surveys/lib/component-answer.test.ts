import { describe, expect, it } from 'vitest';
import { EMPTY_ANSWER, isAnswered, isSameAnswer, readDecimal, toWire, withGrade, withNotInspected } from './component-answer';
import { gradeCounts, progressText, worstGrade } from './grade-summary';
import { describePitch, describeTorque } from './measurements';

describe('toWire', () => {
  it('when a graded component has a note, then it goes as the API takes it, trimmed', () => {
    expect(toWire({ ...EMPTY_ANSWER, grade: 'replace', note: ' Grooves 3 mm deep ' }, null)).toEqual({
      ok: true,
      wire: { grade: 'replace', notInspectedReason: null, note: 'Grooves 3 mm deep', a4PitchHz: null, tuningPinTorqueNm: null },
    });
  });

  it('when marked not inspected without a reason, then it asks for the reason and sends nothing', () => {
    expect(toWire(withNotInspected({ ...EMPTY_ANSWER, grade: 'sound' }, true), null)).toEqual({ ok: false, fields: { notInspectedReason: ['Say why it was not inspected'] } });
  });

  it('when not inspected with a reason, then the grade is left out', () => {
    const answer = { ...withNotInspected({ ...EMPTY_ANSWER, grade: 'sound' }, true), notInspectedReason: 'Action not removed' };
    expect(toWire(answer, null)).toMatchObject({ ok: true, wire: { grade: null, notInspectedReason: 'Action not removed' } });
  });

  it.each([
    ['431.2', 431.2],
    ['431,2', 431.2],
    ['', null],
  ])('when A4 is typed as "%s", then it is sent as %s Hz', (text, hz) => {
    expect(toWire({ ...EMPTY_ANSWER, a4PitchText: text }, 'a4_pitch')).toMatchObject({ ok: true, wire: { a4PitchHz: hz } });
  });

  it.each([
    ['about 430', 'Enter the pitch in hertz, like 438.5'],
    ['250', 'Between 300 and 500 Hz'],
    ['431.255', 'At most two decimals'],
  ])('when A4 is typed as "%s", then it is refused with "%s"', (text, message) => {
    expect(toWire({ ...EMPTY_ANSWER, a4PitchText: text }, 'a4_pitch')).toEqual({ ok: false, fields: { a4PitchHz: [message] } });
  });

  it('when a component takes no measurement, then stray measurement text is not sent', () => {
    expect(toWire({ ...EMPTY_ANSWER, a4PitchText: '431' }, null)).toMatchObject({ ok: true, wire: { a4PitchHz: null } });
  });

  it('when the torque is typed in N·m, then it is read to one decimal', () => {
    expect(toWire({ ...EMPTY_ANSWER, torqueText: '9.5' }, 'tuning_pin_torque')).toMatchObject({ ok: true, wire: { tuningPinTorqueNm: 9.5 } });
    expect(readDecimal('-3')).toBeNaN();
  });
});

describe('answer helpers', () => {
  it('when a pressed grade is tapped again, then it is cleared; another grade replaces it and ends not inspected', () => {
    const graded = withGrade(EMPTY_ANSWER, 'serviceable');
    expect(withGrade(graded, 'serviceable').grade).toBeNull();
    expect(withGrade({ ...graded, isNotInspected: true }, 'replace')).toMatchObject({ grade: 'replace', isNotInspected: false });
  });

  it('when two answers differ only in how a number was typed, then they are the same answer', () => {
    expect(isSameAnswer({ ...EMPTY_ANSWER, a4PitchText: '438.50' }, { ...EMPTY_ANSWER, a4PitchText: '438.5' }, 'a4_pitch')).toBe(true);
    expect(isSameAnswer({ ...EMPTY_ANSWER, note: 'a' }, { ...EMPTY_ANSWER, note: 'b' }, null)).toBe(false);
  });

  it('when not inspected has no reason yet, then the component is not done', () => {
    expect(isAnswered({ ...EMPTY_ANSWER, isNotInspected: true })).toBe(false);
    expect(isAnswered({ ...EMPTY_ANSWER, isNotInspected: true, notInspectedReason: 'Locked' })).toBe(true);
  });
});

describe('grade summary', () => {
  const answers = [
    { ...EMPTY_ANSWER, grade: 'sound' as const },
    { ...EMPTY_ANSWER, grade: 'needs_work' as const },
    { ...EMPTY_ANSWER, grade: 'replace' as const },
    { ...EMPTY_ANSWER, isNotInspected: true, notInspectedReason: 'Action not removed' },
    EMPTY_ANSWER,
  ];

  it('when components are graded, not inspected and open, then each is counted once', () => {
    expect(gradeCounts(answers)).toEqual({ sound: 1, serviceable: 0, needs_work: 1, replace: 1, notInspected: 1, open: 1 });
    expect(progressText(answers)).toBe('4 of 5 done');
  });

  it('when Replace was given, then it is the most serious grade; with nothing graded there is none', () => {
    expect(worstGrade(answers)).toBe('replace');
    expect(worstGrade([EMPTY_ANSWER])).toBeNull();
  });
});

describe('measurements', () => {
  // 1200 × log2(431/440) = −35.78 cents.
  it('when A4 is measured at 431 Hz, then it reads 35.8 cents flat and a pitch raise comes first', () => {
    expect(describePitch('431')).toEqual({ text: '35.8 cents flat of A440', isRaiseNeeded: true });
  });

  it('when A4 is at 440 Hz or slightly sharp, then no pitch raise is called for', () => {
    expect(describePitch('440')).toEqual({ text: 'At A440', isRaiseNeeded: false });
    expect(describePitch('441')?.isRaiseNeeded).toBe(false);
  });

  // 5.0 N·m ÷ 0.112985 N·m per in·lbf = 44.3 in·lbf, below the 50 in·lbf concern line (TRADE.md §5).
  it('when the torque is 5 N·m, then it reads about 44 in·lbf and is flagged low; 12.5 N·m is not', () => {
    expect(describeTorque('5')).toEqual({ text: 'about 44 in·lbf', isLow: true });
    expect(describeTorque('12.5')?.isLow).toBe(false);
  });
});
