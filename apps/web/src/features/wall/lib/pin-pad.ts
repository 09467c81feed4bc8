/** Wall-screen PINs are exactly six digits (the API's rule). */
export const PIN_LENGTH = 6;

export type PinPadAction = { type: 'digit'; digit: string } | { type: 'back' } | { type: 'clear' };

/** The digits entered so far after one press; extra digits beyond six are ignored. */
export function pressPinPad(pin: string, action: PinPadAction): string {
  switch (action.type) {
    case 'digit':
      return /^\d$/.test(action.digit) && pin.length < PIN_LENGTH ? pin + action.digit : pin;
    case 'back':
      return pin.slice(0, -1);
    case 'clear':
      return '';
  }
}

export const isPinComplete = (pin: string) => pin.length === PIN_LENGTH;

/** What a key typed on a keyboard means to the PIN pad, if anything. */
export function pinPadKey(key: string): PinPadAction | 'submit' | undefined {
  if (/^\d$/.test(key)) return { type: 'digit', digit: key };
  if (key === 'Backspace') return { type: 'back' };
  if (key === 'Delete') return { type: 'clear' };
  if (key === 'Enter') return 'submit';
  return undefined;
}
