import { cx } from '@/lib/cx';

/** Keybed's mark: three keys on a key frame. Decorative; the name beside it carries the meaning. */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={cx('size-8 shrink-0', className)}>
      <rect width="32" height="32" rx="6" fill="currentColor" />
      <rect x="6" y="7" width="5" height="18" rx="1" fill="#faf8f5" />
      <rect x="13.5" y="7" width="5" height="18" rx="1" fill="#faf8f5" />
      <rect x="21" y="7" width="5" height="18" rx="1" fill="#faf8f5" />
      <rect x="9.5" y="7" width="3.5" height="11" rx="0.8" fill="#6b4226" />
      <rect x="19" y="7" width="3.5" height="11" rx="0.8" fill="#6b4226" />
    </svg>
  );
}
