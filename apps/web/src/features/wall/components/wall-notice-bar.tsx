import { useEffect } from 'react';
import { cx } from '@/lib/cx';
import type { WallNotice } from '../lib/wall-notice';

const TONES: Record<WallNotice['tone'], string> = { done: 'bg-felt text-white', saved: 'bg-graphite-700 text-white', problem: 'bg-damper text-white' };
const SHOW_MS = 8_000;

/** The outcome of the last action, large at the foot of the home view for a few seconds. */
export function WallNoticeBar({ notice, onGone }: { notice: WallNotice | null; onGone: () => void }) {
  useEffect(() => {
    if (!notice) return;
    const timer = setTimeout(onGone, SHOW_MS);
    return () => clearTimeout(timer);
  }, [notice, onGone]);
  return (
    <div role="status" className="fixed inset-x-0 bottom-0 z-30">
      {notice && <p className={cx('px-10 py-6 text-center text-wall-sm font-bold shadow-lg', TONES[notice.tone])}>{notice.text}</p>}
    </div>
  );
}
