import { cx } from '@/lib/cx';

/** Marks a part at or below its reorder level; the words carry the meaning, not the colour. */
export function LowStockBadge({ className }: { className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-1 rounded-sm border border-damper bg-damper-light px-1.5 text-xs font-semibold text-damper', className)}>
      <svg viewBox="0 0 12 12" aria-hidden="true" className="size-3">
        <path d="M6 9.5 2 4.5h8z" fill="currentColor" />
      </svg>
      Low stock
    </span>
  );
}
