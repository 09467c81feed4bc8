import { useSyncExternalStore } from 'react';

export type ToastTone = 'success' | 'error' | 'info';

export interface Toast {
  id: number;
  tone: ToastTone;
  message: string;
  /** Shown small under the message, e.g. a request reference to quote. */
  detail?: string | undefined;
}

const DISMISS_AFTER_MS = { success: 5_000, info: 6_000, error: 10_000 } as const;
const MAX_VISIBLE = 4;

let toasts: Toast[] = [];
let nextId = 1;
const listeners = new Set<() => void>();

function emit() {
  for (const listener of listeners) listener();
}

export function dismissToast(id: number) {
  toasts = toasts.filter((toast) => toast.id !== id);
  emit();
}

/** Usable outside React (the query client raises error toasts from here). */
export function showToast(tone: ToastTone, message: string, detail?: string) {
  const id = nextId++;
  toasts = [...toasts, { id, tone, message, detail }].slice(-MAX_VISIBLE);
  emit();
  setTimeout(() => dismissToast(id), DISMISS_AFTER_MS[tone]);
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useToasts(): Toast[] {
  return useSyncExternalStore(subscribe, () => toasts);
}
