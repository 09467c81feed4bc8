import { dismissToast, useToasts, type ToastTone } from '@/lib/toast';
import { cx } from '@/lib/cx';

const TONES: Record<ToastTone, string> = {
  success: 'border-l-felt',
  info: 'border-l-graphite-600',
  error: 'border-l-damper',
};

/** Fixed region for short confirmations and errors; screen readers hear each one as it arrives. */
export function ToastRegion() {
  const toasts = useToasts();
  return (
    <section
      aria-label="Notifications"
      className="pointer-events-none fixed inset-x-0 bottom-0 z-50 flex flex-col items-center gap-2 p-4 sm:items-end"
    >
      <div aria-live="polite" aria-relevant="additions" className="flex w-full max-w-sm flex-col gap-2">
        {toasts.map((toast) => (
          <div
            key={toast.id}
            className={cx(
              'pointer-events-auto flex animate-toast-in items-start gap-3 rounded-md border border-graphite-300 border-l-4 bg-white p-3 shadow-lg',
              TONES[toast.tone],
            )}
          >
            <div className="min-w-0 flex-1">
              <p className="text-ink">{toast.message}</p>
              {toast.detail && <p className="mt-1 text-sm text-graphite-500">{toast.detail}</p>}
            </div>
            <button
              type="button"
              onClick={() => dismissToast(toast.id)}
              className="-m-1 rounded px-2 py-1 text-sm font-semibold text-graphite-600 hover:bg-graphite-100"
            >
              Dismiss
            </button>
          </div>
        ))}
      </div>
    </section>
  );
}
