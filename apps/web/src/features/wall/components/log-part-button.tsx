import { cx } from '@/lib/cx';

/** The way into logging a part used; on the green "On now" band it is drawn white on green. */
export function LogPartButton({ isBusy, onClick, isOnBand = false }: { isBusy: boolean; onClick: () => void; isOnBand?: boolean }) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={isBusy}
      className={cx(
        'min-h-24 min-w-64 rounded-xl border-4 px-8 text-wall font-bold shadow-md disabled:opacity-60',
        isOnBand ? 'border-white bg-felt text-white active:bg-felt-light active:text-felt' : 'border-felt bg-white text-felt active:bg-felt-light',
      )}
    >
      Log a part
    </button>
  );
}
