import { useLiveUpdates } from './use-live-updates';

/** Mounted once inside the signed-in layout: keeps every open page in step with the workshop. */
export function LiveUpdates() {
  useLiveUpdates();
  return null;
}
