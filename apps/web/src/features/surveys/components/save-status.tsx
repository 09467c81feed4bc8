import type { SaveState } from '../lib/save-queue';
import { cx } from '@/lib/cx';

/** The words for where an answer stands; every state but "Saved" means it is kept on this device. */
export function saveStatusText(state: SaveState<unknown>): string {
  switch (state.kind) {
    case 'saved':
      return 'Saved';
    case 'saving':
      return 'Saving…';
    case 'retrying':
      return state.isSignedOut ? 'Not saved yet — will retry once you sign in again' : 'Not saved yet — will retry';
    case 'invalid':
      return 'Not saved yet — check the highlighted field';
    case 'refused':
      return `Not saved — ${state.message}`;
    case 'conflict':
      return 'Not saved — someone else saved this too';
  }
}

const TONES: Record<SaveState<unknown>['kind'], string> = {
  saved: 'text-felt',
  saving: 'text-graphite-600',
  retrying: 'text-damper',
  invalid: 'text-damper',
  refused: 'text-damper',
  conflict: 'text-damper',
};

/** Shown beside each thing saved as you go; announced politely when it changes. */
export function SaveStatus({ state, className }: { state: SaveState<unknown>; className?: string }) {
  return (
    <p role="status" className={cx('flex items-center gap-1.5 text-sm font-semibold', TONES[state.kind], className)}>
      <span aria-hidden="true" className={cx('inline-block size-2 rounded-full', state.kind === 'saved' ? 'bg-felt' : state.kind === 'saving' ? 'bg-graphite-400' : 'bg-damper')} />
      {saveStatusText(state)}
    </p>
  );
}
