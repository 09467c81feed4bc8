import { useEffect, useState } from 'react';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { cx } from '@/lib/cx';
import { controlClasses } from './text-input';

interface SearchFieldProps {
  label: string;
  /** The search as it stands (e.g. from the URL); typing is reported after a pause. */
  value: string;
  onSearch: (text: string) => void;
  placeholder?: string;
  delayMs?: number;
  isCompact?: boolean;
  className?: string;
}

/** A labelled search box that reports what was typed once typing pauses. */
export function SearchField({ label, value, onSearch, placeholder, delayMs = 300, isCompact = false, className }: SearchFieldProps) {
  const [text, setText] = useState(value);
  const settled = useDebouncedValue(text, delayMs);

  // Back/forward or a "clear filters" link changes the value from outside.
  useEffect(() => setText(value), [value]);
  useEffect(() => {
    if (settled.trim() !== value.trim()) onSearch(settled.trim());
    // Only a newly settled text is reported; `value` catching up must not report it again.
  }, [settled]);

  return (
    <div className={className}>
      <label className={cx('mb-1 block font-semibold', isCompact && 'text-sm')}>
        {label}
        <input
          type="search"
          value={text}
          placeholder={placeholder}
          onChange={(event) => setText(event.target.value)}
          className={cx(controlClasses, 'mt-1 font-normal', isCompact ? 'min-h-9 text-sm' : 'min-h-11')}
        />
      </label>
    </div>
  );
}
