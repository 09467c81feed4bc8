import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { AppError } from '../http/errors';

/** Longest side of the web copy and of the thumbnail, in pixels. */
export const WEB_SIZE_PX = 1600;
export const THUMB_SIZE_PX = 320;

const ACCEPTED = new Set(['image/jpeg', 'image/png', 'image/webp']);
const HEIF = new Set(['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence', 'image/avif']);

export interface ProcessedImage {
  sourceType: 'image/jpeg' | 'image/png' | 'image/webp';
  web: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

const refuse = (message: string, field: string) => new AppError('unsupported_file', 415, message, { [field]: [message] });

/**
 * Decides the type from the content (never the name or the sent type), then makes a web-size copy
 * and a thumbnail as JPEG, turned upright by the camera's orientation and with every piece of
 * metadata (EXIF with GPS position, XMP, ICC) left out: sharp writes none unless asked.
 */
export async function processImage(buffer: Buffer, field: string): Promise<ProcessedImage> {
  const detected = await fileTypeFromBuffer(buffer);
  if (detected && HEIF.has(detected.mime)) {
    throw refuse('HEIC photos cannot be read here yet. Set the camera to save JPEG, or export the photo as JPEG, and upload that.', field);
  }
  if (!detected || !ACCEPTED.has(detected.mime)) {
    throw refuse('This file is not a JPEG, PNG or WebP photo (its content was checked, not its name).', field);
  }
  try {
    const base = () => sharp(buffer, { failOn: 'error' }).rotate().flatten({ background: '#ffffff' });
    const web = await base().resize({ width: WEB_SIZE_PX, height: WEB_SIZE_PX, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 82, mozjpeg: true }).toBuffer({ resolveWithObject: true });
    const thumb = await base().resize({ width: THUMB_SIZE_PX, height: THUMB_SIZE_PX, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 75, mozjpeg: true }).toBuffer();
    return { sourceType: detected.mime as ProcessedImage['sourceType'], web: web.data, thumb, width: web.info.width, height: web.info.height };
  } catch {
    throw refuse('This photo could not be read; it may be damaged. Try taking or exporting it again.', field);
  }
}
