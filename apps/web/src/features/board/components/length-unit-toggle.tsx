import { cx } from '@/lib/cx';
import { LENGTH_UNIT_OPTIONS, setLengthUnit, useLengthUnit } from '@/lib/length-unit';

/** Sizes in feet and inches or centimetres; the choice is kept in this browser. */
export function LengthUnitToggle() {
  const unit = useLengthUnit();
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="float-left mr-2 text-sm font-semibold">Sizes in</legend>
      <div className="flex rounded-md border border-graphite-400 bg-white p-0.5">
        {LENGTH_UNIT_OPTIONS.map((option) => (
          <label
            key={option.value}
            className={cx(
              'relative flex min-h-8 cursor-pointer items-center rounded px-2.5 text-sm font-semibold has-focus-visible:outline-3 has-focus-visible:outline-spruce-deep',
              unit === option.value ? 'bg-walnut text-white' : 'text-ink hover:bg-graphite-100',
            )}
          >
            <input
              type="radio"
              name="length-unit"
              value={option.value}
              checked={unit === option.value}
              onChange={() => setLengthUnit(option.value)}
              className="absolute inset-0 m-0 cursor-pointer opacity-0"
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
