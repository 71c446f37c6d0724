import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { PHOTO_LIMITS } from '@shared/schemas/photo.schemas';

/** Refuse anything that would decode to more than this many pixels (a decompression bomb). */
export const MAX_INPUT_PIXELS = 50_000_000;

type StoredFormat = 'jpg' | 'png' | 'webp';

// The prebuilt sharp packages include libheif with AV1 (AVIF) only; HEIC photos from phones use HEVC,
// which they cannot decode. Accept HEIC only when the sharp in use says it reads .heic files.
export const heicSupported = (sharp.format.heif?.input?.fileSuffix ?? []).includes('.heic');

const ACCEPTED: Record<string, StoredFormat> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  ...(heicSupported ? { 'image/heic': 'jpg' as const, 'image/heif': 'jpg' as const } : {}),
};

export const acceptedTypesText = heicSupported ? 'JPEG, PNG, WebP or HEIC' : 'JPEG, PNG or WebP';

export interface CleanImage {
  bytes: Buffer;
  format: StoredFormat;
  mime: string;
  width: number;
  height: number;
}

/** Why a file was refused, in words that can follow its name. */
export class ImageRefused extends Error {}

/**
 * Checks what a file really is from its bytes (never its name or the browser's Content-Type), then
 * decodes and re-encodes it: turned upright per EXIF, scaled to fit the long-side cap, and written
 * without any metadata (sharp keeps none unless asked), so camera and GPS tags never reach storage.
 */
export async function cleanImage(input: Buffer): Promise<CleanImage> {
  if (input.length === 0) throw new ImageRefused('is empty');
  const detected = await fileTypeFromBuffer(input);
  const format = detected && ACCEPTED[detected.mime];
  if (!format) throw new ImageRefused(`is not a ${acceptedTypesText} image`);
  const pipeline = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error', sequentialRead: true })
    .rotate()
    .resize({ width: PHOTO_LIMITS.longSidePx, height: PHOTO_LIMITS.longSidePx, fit: 'inside', withoutEnlargement: true });
  const encoded =
    format === 'png'
      ? pipeline.png({ compressionLevel: 9 })
      : format === 'webp'
        ? pipeline.webp({ quality: 85 })
        : pipeline.jpeg({ quality: 85, mozjpeg: true });
  try {
    const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
    return { bytes: data, format, mime: MIME[format], width: info.width, height: info.height };
  } catch (error) {
    if (/pixel limit/i.test((error as Error).message)) throw new ImageRefused(`is too large in pixels (over ${MAX_INPUT_PIXELS / 1_000_000} megapixels)`);
    throw new ImageRefused('could not be read as an image; it may be damaged');
  }
}

const MIME: Record<StoredFormat, string> = { jpg: 'image/jpeg', png: 'image/png', webp: 'image/webp' };
