import { describe, expect, it } from 'vitest';
import { isPinComplete, pinPadKey, pressPinPad, type PinPadAction } from './pin-pad';

const press = (...actions: PinPadAction[]) => actions.reduce(pressPinPad, '');
const digits = (text: string) => [...text].map((digit): PinPadAction => ({ type: 'digit', digit }));

describe('pressPinPad', () => {
  it('when six digits are pressed, then the PIN is complete', () => {
    const pin = press(...digits('246810'));
    expect(pin).toBe('246810');
    expect(isPinComplete(pin)).toBe(true);
  });

  it('when a seventh digit is pressed, then it is ignored', () => {
    expect(press(...digits('2468101'))).toBe('246810');
  });

  it('when back is pressed, then the last digit goes; on an empty pad nothing happens', () => {
    expect(press(...digits('246'), { type: 'back' })).toBe('24');
    expect(press({ type: 'back' })).toBe('');
  });

  it('when clear is pressed, then every digit goes', () => {
    expect(press(...digits('2468'), { type: 'clear' })).toBe('');
  });

  it('when something other than a digit arrives, then it is ignored', () => {
    expect(press({ type: 'digit', digit: 'a' }, { type: 'digit', digit: '12' })).toBe('');
  });
});

describe('pinPadKey', () => {
  it('when keys are typed, then digits, Backspace, Delete and Enter have meanings and others none', () => {
    expect(pinPadKey('7')).toEqual({ type: 'digit', digit: '7' });
    expect(pinPadKey('Backspace')).toEqual({ type: 'back' });
    expect(pinPadKey('Delete')).toEqual({ type: 'clear' });
    expect(pinPadKey('Enter')).toBe('submit');
    expect(pinPadKey('x')).toBeUndefined();
    expect(pinPadKey('Shift')).toBeUndefined();
  });
});
