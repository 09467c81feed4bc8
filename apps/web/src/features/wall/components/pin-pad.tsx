import { useEffect, useRef } from 'react';
import { cx } from '@/lib/cx';
import { PIN_LENGTH, pinPadKey, pressPinPad, type PinPadAction } from '../lib/pin-pad';

interface PinPadProps {
  pin: string;
  onChange: (pin: string) => void;
  onSubmit: () => void;
  isBusy: boolean;
  /** What went wrong with the last PIN, in plain words. */
  message?: string | undefined;
}

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
const keyClasses =
  'flex min-h-20 items-center justify-center rounded-xl lg:min-h-24 border-2 border-graphite-400 bg-white text-wall font-bold text-ink shadow-sm active:bg-graphite-200 disabled:opacity-50';

/** Six masked dots and a large keypad; a keyboard works too (digits, Backspace, Delete, Enter). */
export function PinPad({ pin, onChange, onSubmit, isBusy, message }: PinPadProps) {
  // Keys can arrive faster than React renders: each press builds on the last one, not on the last render.
  const current = useRef(pin);
  current.current = pin;
  const press = (action: PinPadAction) => {
    const next = pressPinPad(current.current, action);
    if (isBusy || next === current.current) return;
    current.current = next;
    onChange(next);
  };
  const latest = useRef({ press, onSubmit });
  latest.current = { press, onSubmit };

  useEffect(() => {
    function onKey(event: KeyboardEvent) {
      if (event.ctrlKey || event.metaKey || event.altKey) return;
      const action = pinPadKey(event.key);
      if (!action) return;
      event.preventDefault();
      if (action === 'submit') latest.current.onSubmit();
      else latest.current.press(action);
    }
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, []);

  return (
    <div className="mx-auto flex w-full max-w-md flex-col items-center gap-5 lg:max-w-xl">
      <p className="text-wall-sm font-semibold">Enter your PIN</p>
      <div role="img" aria-label={`${pin.length} of ${PIN_LENGTH} digits entered`} className="flex gap-4">
        {Array.from({ length: PIN_LENGTH }, (_, i) => (
          <span key={i} className={cx('size-7 rounded-full border-4', i < pin.length ? 'border-ink bg-ink' : 'border-graphite-400 bg-white')} />
        ))}
      </div>
      <p role="alert" className={cx('min-h-9 text-center text-xl font-semibold text-damper', !message && 'invisible')}>
        {message ?? ' '}
      </p>
      <div role="group" aria-label="PIN pad" className="grid w-full grid-cols-3 gap-3">
        {KEYS.map((digit) => (
          <button key={digit} type="button" className={keyClasses} disabled={isBusy} onClick={() => press({ type: 'digit', digit })}>
            {digit}
          </button>
        ))}
        <button type="button" className={cx(keyClasses, 'text-wall-sm')} disabled={isBusy} onClick={() => press({ type: 'clear' })}>
          Clear
        </button>
        <button type="button" className={keyClasses} disabled={isBusy} onClick={() => press({ type: 'digit', digit: '0' })}>
          0
        </button>
        <button type="button" className={cx(keyClasses, 'text-wall-sm')} disabled={isBusy} onClick={() => press({ type: 'back' })}>
          <span aria-hidden="true">⌫&nbsp;</span>Delete
        </button>
      </div>
    </div>
  );
}
