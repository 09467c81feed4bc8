import { KEYTOP_MATERIALS, PIANO_TYPES, parseLengthMm, type FieldErrors, type KeytopMaterial } from '@keybed/shared';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { PIANO_TYPE_LABELS } from '@/lib/piano';

export const PIANO_TYPE_OPTIONS = PIANO_TYPES.map((type) => ({ value: type, label: PIANO_TYPE_LABELS[type] }));

const KEYTOP_LABELS: Record<KeytopMaterial, string> = { ivory: 'Ivory', plastic: 'Plastic', other: 'Other', unknown: 'Not known' };
export const KEYTOP_OPTIONS = KEYTOP_MATERIALS.map((material) => ({ value: material, label: KEYTOP_LABELS[material] }));

/**
 * Size text → whole millimetres, or null when left empty. A bare number counts as centimetres for
 * members who work in centimetres; in feet and inches a unit is required (a bare 70 is ambiguous).
 */
export function readSize(text: string, unit: PreferredLengthUnit): { ok: true; mm: number | null } | { ok: false; message: string } {
  if (text.trim() === '') return { ok: true, mm: null };
  const parsed = parseLengthMm(text, unit === 'cm' ? { defaultUnit: 'cm' } : {});
  return parsed.ok ? { ok: true, mm: Math.round(parsed.mm) } : parsed;
}

/** Year text → a number, null when empty, or a message. */
export function readYear(text: string): { ok: true; year: number | null } | { ok: false; message: string } {
  const trimmed = text.trim().replace(/^c\.?\s*/i, '');
  if (trimmed === '') return { ok: true, year: null };
  if (!/^\d{4}$/.test(trimmed)) return { ok: false, message: 'Enter a four-digit year, like 1911' };
  return { ok: true, year: Number(trimmed) };
}

interface RawPianoValues {
  [name: string]: string | undefined;
}

/**
 * The form's text values as the API's piano fields. The size is sent only when its text changed,
 * so re-showing a stored size rounded to ¼ in never rewrites the stored millimetres.
 */
export function toPianoFields(values: RawPianoValues, unit: PreferredLengthUnit, initialSizeText: string) {
  const fields: FieldErrors = {};
  const size = values.size === initialSizeText ? null : readSize(values.size ?? '', unit);
  if (size && !size.ok) fields.sizeMm = [size.message];
  const year = readYear(values.yearApprox ?? '');
  if (!year.ok) fields.yearApprox = [year.message];
  const input = {
    maker: values.maker,
    model: values.model,
    serialNumber: values.serialNumber,
    type: values.type,
    ...(size?.ok ? { sizeMm: size.mm } : {}),
    yearApprox: year.ok ? year.year : undefined,
    caseFinish: values.caseFinish,
    keytopMaterial: values.keytopMaterial,
    notes: values.notes,
  };
  return { input, fields };
}
