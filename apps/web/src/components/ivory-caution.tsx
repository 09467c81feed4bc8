import { TextLink } from './text-link';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';

/** Calm, one-sentence caution for instruments with ivory keytops; the help page says more. */
export function IvoryCaution({ className }: { className?: string }) {
  return (
    <aside
      aria-label="Ivory keytops"
      className={cx('flex items-start gap-3 rounded-md border border-graphite-300 bg-spruce-light p-3 text-ink', className)}
    >
      <svg viewBox="0 0 20 20" aria-hidden="true" className="mt-0.5 size-5 shrink-0 text-walnut">
        <circle cx="10" cy="10" r="8.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
        <rect x="9.1" y="8.5" width="1.8" height="6" rx="0.9" fill="currentColor" />
        <circle cx="10" cy="5.8" r="1.1" fill="currentColor" />
      </svg>
      <p>
        This piano has ivory keytops: selling or exporting it may need an exemption or registration under local law
        (in the UK the Ivory Act 2018; CITES permits for export), so check the rules where you are.{' '}
        <TextLink to={paths.ivoryHelp.build()}>More about ivory and the law</TextLink>
      </p>
    </aside>
  );
}
