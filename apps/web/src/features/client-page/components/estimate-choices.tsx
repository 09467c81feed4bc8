import type { ClientPage } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { formatMinor } from '@/lib/money';
import { differenceMinor, type Picks } from '../lib/option-totals';
import { EstimateLines } from './estimate-lines';

type ClientEstimate = ClientPage['estimate'];

interface EstimateChoicesProps {
  estimate: ClientEstimate;
  picks: Picks;
  /** Once answered, the choices are shown but no longer change. */
  isLocked: boolean;
  onPick: (choice: string, optionId: string) => void;
}

/** Each choice as a group of radio buttons: the option, its price ex VAT, what it includes. */
export function EstimateChoices({ estimate, picks, isLocked, onPick }: EstimateChoicesProps) {
  return (
    <div className="space-y-4">
      {estimate.choices.map((group, i) => (
        <fieldset key={group.choice} className="rounded-lg border border-graphite-300 bg-white p-4">
          <legend className="px-1 text-lg font-semibold">{group.choice}: choose one</legend>
          <div className="mt-2 space-y-3">
            {group.options.map((option) => {
              const isPicked = picks[group.choice] === option.id;
              const difference = isPicked ? 0 : differenceMinor(estimate, picks, group.choice, option.id);
              return (
                <div key={option.id} className={cx('rounded-md border-2 p-3', isPicked ? 'border-walnut bg-spruce-light' : 'border-graphite-200')}>
                  <label className={cx('flex items-start gap-3', isLocked ? 'cursor-default' : 'cursor-pointer')}>
                    <input
                      type="radio"
                      name={`choice-${i}`}
                      value={option.id}
                      checked={isPicked}
                      disabled={isLocked && !isPicked}
                      onChange={() => onPick(group.choice, option.id)}
                      className="mt-1 size-5 shrink-0 accent-walnut"
                    />
                    <span className="min-w-0 flex-1">
                      <span className="flex flex-wrap items-baseline justify-between gap-x-3">
                        <span className="font-semibold">{option.name}</span>
                        <span className="tabular-figures">{formatMinor(option.netMinor, estimate.currency)} ex VAT</span>
                      </span>
                      {!isLocked && difference !== 0 && (
                        <span className="block text-sm text-graphite-600 tabular-figures">
                          {difference > 0 ? 'Adds' : 'Saves'} {formatMinor(Math.abs(difference), estimate.currency)} with VAT
                        </span>
                      )}
                    </span>
                  </label>
                  {option.lines.length > 0 && (
                    <div className="mt-2 pl-8">
                      <EstimateLines lines={option.lines} currency={estimate.currency} label={`What “${option.name}” includes`} />
                    </div>
                  )}
                </div>
              );
            })}
          </div>
        </fieldset>
      ))}
    </div>
  );
}
