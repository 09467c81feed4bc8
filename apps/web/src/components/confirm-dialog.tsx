import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

interface ConfirmDialogProps {
  isOpen: boolean;
  title: string;
  /** Say plainly what will be lost or changed. */
  children: ReactNode;
  /** Names the action, e.g. "Deactivate Priya". */
  confirmLabel: string;
  cancelLabel?: string;
  isDestructive?: boolean;
  isPending?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}

/**
 * Modal confirmation on the native <dialog>: focus moves in and is kept inside, Escape cancels,
 * and focus returns to the control that opened it.
 */
export function ConfirmDialog(props: ConfirmDialogProps) {
  const { isOpen, title, children, confirmLabel, cancelLabel = 'Cancel', isDestructive = true, isPending = false } = props;
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (isOpen && !dialog.open) dialog.showModal();
    if (!isOpen && dialog.open) dialog.close();
  }, [isOpen]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={bodyId}
      onCancel={(event) => {
        event.preventDefault();
        if (!isPending) props.onCancel();
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg text-left border border-graphite-300 bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/60"
    >
      <div className="p-6">
        <h2 id={titleId} className="text-lg font-bold">
          {title}
        </h2>
        <div id={bodyId} className="mt-2 space-y-2 text-graphite-700">
          {children}
        </div>
        <div className="mt-6 flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
          <Button variant="secondary" onClick={props.onCancel} disabled={isPending} autoFocus>
            {cancelLabel}
          </Button>
          <Button variant={isDestructive ? 'danger' : 'primary'} onClick={props.onConfirm} isPending={isPending}>
            {confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
