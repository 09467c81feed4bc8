/** Reads the WIP limit field: empty means no limit; anything else must be a whole number. */
export function readWipLimit(text: string): { ok: true; value: number | null } | { ok: false; message: string } {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: true, value: null };
  if (!/^\d+$/.test(trimmed)) return { ok: false, message: 'WIP limit must be a whole number, or empty for no limit' };
  return { ok: true, value: Number(trimmed) };
}
