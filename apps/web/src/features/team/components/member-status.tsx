import { cx } from '@/lib/cx';

export function MemberStatus({ isActive }: { isActive: boolean }) {
  return (
    <span className="inline-flex items-center gap-2">
      <span aria-hidden="true" className={cx('size-2.5 rounded-full', isActive ? 'bg-felt' : 'bg-graphite-400')} />
      {isActive ? 'Active' : 'Deactivated'}
    </span>
  );
}
