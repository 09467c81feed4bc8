import type { WallPart, WallTask } from '@keybed/shared';

const words = (text: string) => text.toLowerCase().split(/\s+/).filter(Boolean);

/** Parts whose name, SKU or unit hold every word searched for, in the catalogue's order. */
export function matchParts(parts: readonly WallPart[], query: string): WallPart[] {
  const wanted = words(query);
  if (wanted.length === 0) return [...parts];
  return parts.filter((part) => {
    const text = [part.name, part.sku, part.unit].join(' ').toLowerCase();
    return wanted.every((word) => text.includes(word));
  });
}

/** The task a part is logged to when nothing else is chosen: the one they are on, if it is still open. */
export function defaultPartTask(tasks: readonly WallTask[], runningTaskId: string | undefined): WallTask | undefined {
  return runningTaskId === undefined ? undefined : tasks.find((t) => t.id === runningTaskId);
}
