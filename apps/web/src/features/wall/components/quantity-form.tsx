import { useId, useState, type FormEvent } from 'react';
import type { WallPart } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { logButtonText } from '../lib/part-messages';
import { canStepDown, parsePartQuantity, quantityRule, stepPartQuantity } from '../lib/part-quantity';

interface QuantityFormProps {
  part: WallPart;
  isBusy: boolean;
  onSubmit: (quantityMilli: number) => void;
}

const stepClasses =
  'flex size-24 shrink-0 items-center justify-center rounded-xl border-2 border-graphite-400 bg-white text-wall-lg font-bold shadow-sm active:bg-graphite-200 disabled:opacity-40';

/**
 * How much of the part: large − and + buttons around a field that takes what is typed (decimals
 * where the unit allows them). A quantity that does not read right is said beside the field and
 * nothing is sent.
 */
export function QuantityForm({ part, isBusy, onSubmit }: QuantityFormProps) {
  const id = useId();
  const rule = quantityRule(part.unit);
  const [text, setText] = useState('1');
  const [problem, setProblem] = useState<string | null>(null);
  const parsed = parsePartQuantity(text, rule);
  const step = rule.stepMilli === 1000 ? '1' : '0.5';

  const change = (next: string) => {
    setText(next);
    setProblem(null);
  };
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (isBusy) return;
    if (!parsed.ok) return setProblem(parsed.message);
    onSubmit(parsed.milli);
  };

  return (
    <form noValidate onSubmit={submit} aria-label="How much was used" className="space-y-4">
      <label htmlFor={`${id}-quantity`} className="block text-wall-sm font-semibold">
        Quantity
      </label>
      <div className="flex flex-wrap items-center gap-4">
        <button type="button" className={stepClasses} aria-label={`${step} ${part.unit} less`} disabled={isBusy || !canStepDown(text, rule)} onClick={() => change(stepPartQuantity(text, rule, -1))}>
          −
        </button>
        <input
          id={`${id}-quantity`}
          type="text"
          inputMode={rule.allowsDecimals ? 'decimal' : 'numeric'}
          autoComplete="off"
          value={text}
          onChange={(e) => change(e.target.value)}
          aria-invalid={problem !== null}
          aria-describedby={problem ? `${id}-unit ${id}-problem` : `${id}-unit`}
          className={cx(
            'min-h-24 w-44 rounded-xl border-2 border-graphite-400 bg-white px-4 text-center text-wall-lg font-bold tabular-figures',
            'aria-invalid:border-4 aria-invalid:border-damper',
          )}
        />
        <button type="button" className={stepClasses} aria-label={`${step} ${part.unit} more`} disabled={isBusy} onClick={() => change(stepPartQuantity(text, rule, 1))}>
          +
        </button>
        <span id={`${id}-unit`} className="text-wall font-semibold">
          {part.unit}
          {!rule.allowsDecimals && <span className="sr-only"> (whole numbers)</span>}
        </span>
      </div>
      {problem && (
        <p id={`${id}-problem`} role="alert" className="text-xl font-semibold text-damper">
          {problem}
        </p>
      )}
      <button
        type="submit"
        disabled={isBusy}
        className="min-h-24 w-full rounded-xl bg-felt px-8 py-3 text-wall font-bold text-white shadow-md active:bg-felt/90 disabled:opacity-60 lg:w-auto lg:min-w-[32rem]"
      >
        {logButtonText(part, parsed.ok ? parsed.milli : undefined)}
      </button>
    </form>
  );
}
