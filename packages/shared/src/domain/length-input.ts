/**
 * Reading lengths typed by people (`5' 10"`, `5 ft 10 in`, `5ft10`, `70 in`, `177.8 cm`,
 * `1778 mm`) and showing millimetres back in the unit they prefer.
 */
import { MAX_PLAUSIBLE_LENGTH_MM, inchesToMm, mmToFeetInches } from './units';

/** Result of {@link parseLengthMm}: millimetres, or a message fit to show beside the input. */
export type LengthParseResult = { ok: true; mm: number } | { ok: false; message: string };

/** How a length is shown. */
export type LengthDisplayUnit = 'ft-in' | 'cm' | 'mm';

const NUM = String.raw`(\d+(?:\.\d+)?|\.\d+)`;
const INCH = String.raw`(\d+(?:\.\d+)?(?:[\s-]+\d+\/\d+)?|\d+\/\d+)`;
const FEET_INCHES = new RegExp(
  String.raw`^${NUM}\s*(?:'|ft|feet|foot)\.?\s*(?:${INCH}\s*(?:"|in|inch|inches)?\.?)?$`,
);
const INCHES_ONLY = new RegExp(String.raw`^${INCH}\s*(?:"|in|inch|inches)\.?$`);
const METRIC = new RegExp(String.raw`^${NUM}\s*(mm|cm|m)$`);
const BARE = new RegExp(String.raw`^${NUM}$`);
const FRACTION_GLYPHS: Record<string, string> = { '¼': '1/4', '½': '1/2', '¾': '3/4', '⅛': '1/8', '⅜': '3/8', '⅝': '5/8', '⅞': '7/8' };
const GLYPH_FOR_QUARTERS = ['', '¼', '½', '¾'];
const HINT = 'Try 5 ft 10 in, 70 in, 177.8 cm or 1778 mm';

function normalise(input: string): string {
  return input
    .trim()
    .toLowerCase()
    .replace(/[¼½¾⅛⅜⅝⅞]/g, (g) => ` ${FRACTION_GLYPHS[g]}`)
    .replace(/[’‘′]/g, "'")
    .replace(/[”“″]|''/g, '"')
    .replace(/\u2212/g, '-')
    .replace(/\s+/g, ' ')
    .trim();
}

/** "10", "10.5", "10 1/2", "10-1/2", "1/2" → inches; NaN when a denominator is zero. */
function readInches(text: string): number {
  const parts = text.split(/[\s-]+/);
  return parts.reduce((sum, part) => {
    const [n, d] = part.split('/');
    return sum + (d === undefined ? Number(n) : Number(n) / Number(d));
  }, 0);
}

/** Amount in millimetres from a normalised, unsigned string, or a message. */
function readUnsigned(text: string, defaultUnit?: 'mm' | 'cm' | 'in'): LengthParseResult {
  const metric = METRIC.exec(text);
  if (metric) {
    const shift = { mm: '', cm: 'e1', m: 'e3' }[metric[2] as 'mm' | 'cm' | 'm'];
    return { ok: true, mm: Number(`${metric[1]}${shift}`) };
  }
  const inchesOnly = INCHES_ONLY.exec(text);
  if (inchesOnly) return { ok: true, mm: inchesToMm(readInches(inchesOnly[1] ?? '')) };
  const feetInches = FEET_INCHES.exec(text);
  if (feetInches) {
    const inches = feetInches[2] === undefined ? 0 : readInches(feetInches[2]);
    if (inches >= 12) return { ok: false, message: 'Inches after feet must be less than 12' };
    return { ok: true, mm: inchesToMm(Number(feetInches[1]) * 12 + inches) };
  }
  const bare = BARE.exec(text);
  if (bare && defaultUnit) return readUnsigned(`${bare[1]} ${defaultUnit}`);
  if (bare) return { ok: false, message: `Add a unit. ${HINT}` };
  return { ok: false, message: `Could not read "${text}" as a length. ${HINT}` };
}

/**
 * Parses a typed length into millimetres, rounded to 0.001 mm. Accepts feet and inches (with
 * decimal or fractional inches, ¼ ½ ¾ glyphs, straight or curly quotes), inches, m, cm and mm.
 * A bare number is read in `defaultUnit` when given, else refused. Refuses empty, negative, zero,
 * unreadable, and anything above `maxMm` (default 4000 mm, a likely unit mistake).
 */
export function parseLengthMm(
  input: string,
  options: { defaultUnit?: 'mm' | 'cm' | 'in'; maxMm?: number } = {},
): LengthParseResult {
  const text = normalise(input);
  if (text === '') return { ok: false, message: 'Enter a length' };
  const isNegative = text.startsWith('-');
  const result = readUnsigned(isNegative ? text.slice(1).trim() : text, options.defaultUnit);
  if (!result.ok) return result;
  const maxMm = options.maxMm ?? MAX_PLAUSIBLE_LENGTH_MM;
  if (isNegative) return { ok: false, message: 'A length cannot be negative' };
  if (!Number.isFinite(result.mm)) return { ok: false, message: `Could not read "${input.trim()}" as a length. ${HINT}` };
  if (result.mm === 0) return { ok: false, message: 'A length must be more than zero' };
  if (result.mm > maxMm) return { ok: false, message: `That is more than ${maxMm} mm; check the unit` };
  return { ok: true, mm: Math.round(result.mm * 1000) / 1000 };
}

/**
 * Shows millimetres as `5 ft 10 in` / `5 ft 10¼ in` (nearest ¼ in by default, or whole inches with
 * `inchStep: 1`; halves round up), `177.8 cm` (nearest mm) or `1778 mm` (nearest 0.1 mm).
 * Numbers use the locale's digits and separators. Expects mm ≥ 0.
 */
export function formatLengthMm(
  mm: number,
  unit: LengthDisplayUnit,
  options: { inchStep?: 0.25 | 1; locale?: string } = {},
): string {
  const locale = options.locale ?? 'en-GB';
  const oneDecimal = new Intl.NumberFormat(locale, { maximumFractionDigits: 1 });
  if (unit === 'cm') return `${oneDecimal.format(Math.round(mm) / 10)} cm`;
  if (unit === 'mm') return `${oneDecimal.format(Math.round(mm * 10) / 10)} mm`;
  const { feet, inches } = mmToFeetInches(mm, options.inchStep ?? 0.25);
  const whole = Math.floor(inches);
  const glyph = GLYPH_FOR_QUARTERS[Math.round((inches - whole) * 4)] ?? '';
  const inchText = `${whole === 0 && glyph !== '' ? '' : whole}${glyph} in`;
  return feet === 0 ? inchText : `${feet} ft ${inchText}`;
}
