import { formatLengthMm, type PianoType } from '@keybed/shared';
import type { PreferredLengthUnit } from './length-unit';

export const PIANO_TYPE_LABELS: Record<PianoType, string> = {
  grand: 'Grand',
  upright: 'Upright',
  square: 'Square',
  other: 'Other',
};

/** "Carrow & Finch Salon", or the maker alone when the model is unknown. */
export function pianoName(piano: { maker: string; model: string }): string {
  return [piano.maker, piano.model].filter((part) => part.trim() !== '').join(' ');
}

/** Size in the member's unit, whole inches for ft-in (a card has no room for quarters). */
export function pianoSize(sizeMm: number | null, unit: PreferredLengthUnit, inchStep: 0.25 | 1 = 1): string | null {
  return sizeMm === null ? null : formatLengthMm(sizeMm, unit, { inchStep });
}

/** "grand, 5 ft 10 in": the type, and the size when known. */
export function pianoShape(piano: { type: PianoType; sizeMm: number | null }, unit: PreferredLengthUnit): string {
  const size = pianoSize(piano.sizeMm, unit);
  const type = PIANO_TYPE_LABELS[piano.type].toLowerCase();
  return size ? `${type}, ${size}` : type;
}
