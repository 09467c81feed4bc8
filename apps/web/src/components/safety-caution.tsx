import type { SafetyCaution } from '@keybed/shared';
import { TextLink } from './text-link';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';

/** The accessible name of a caution, e.g. "Caution: moving a piano". */
export const cautionLabel = (caution: SafetyCaution) => `Caution: ${caution.title.toLowerCase()}`;

/** A calm warning triangle; decorative, since the caution's name says what it is. */
export function CautionIcon({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 20 20" aria-hidden="true" className={cx('shrink-0 text-walnut', className)}>
      <path d="M10 2.5 18 17H2z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      <rect x="9.2" y="7.5" width="1.6" height="5" rx="0.8" fill="currentColor" />
      <circle cx="10" cy="14.6" r="1" fill="currentColor" />
    </svg>
  );
}

interface SafetyCautionsProps {
  cautions: readonly SafetyCaution[];
  /** `compact` sits inside a list row; `panel` stands on its own, like the ivory caution. */
  variant?: 'compact' | 'panel';
  className?: string;
}

/** Safety cautions where the work can hurt someone: an icon, one sentence, a link to the help page. */
export function SafetyCautions({ cautions, variant = 'compact', className }: SafetyCautionsProps) {
  if (cautions.length === 0) return null;
  const isPanel = variant === 'panel';
  return (
    <div className={cx('space-y-2', className)}>
      {cautions.map((caution) => (
        <div
          key={caution.id}
          role="note"
          aria-label={cautionLabel(caution)}
          className={cx('flex items-start gap-2', isPanel ? 'gap-3 rounded-md border border-graphite-300 bg-spruce-light p-3 text-ink' : 'text-sm text-graphite-700')}
        >
          <CautionIcon className={isPanel ? 'mt-0.5 size-5' : 'mt-0.5 size-4'} />
          <p>
            {caution.sentence}{' '}
            <TextLink to={paths.safetyHelp.build(caution.helpAnchor)}>More on {caution.title.toLowerCase()}</TextLink>
          </p>
        </div>
      ))}
    </div>
  );
}
