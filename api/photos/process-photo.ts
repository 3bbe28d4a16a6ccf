// Turns an uploaded photo into what is kept: decoded by sharp whatever its name or type claims, upright, without metadata.
import sharp from 'sharp';
import { AppError } from '../http/app-error.js';
import { jpegMetadataBytes } from './jpeg-metadata-bytes.js';
import { photoLimits } from './photo-limits.js';

export interface ProcessedPhoto {
  originalName: string;
  display: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

const acceptedFormats = new Set(['jpeg', 'png', 'webp', 'heif', 'avif', 'tiff', 'gif']);

/** For display only: the base name, printable, short; it never becomes a path. */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  return base.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 120);
}

function refuse(status: number, index: number, name: string, message: string): AppError {
  return new AppError(status, status === 413 ? 'too_large' : 'bad_request', `${name}: ${message}`, [{ field: `photos.${index}`, message }]);
}

export async function processPhoto(file: { buffer: Buffer; originalname: string }, index: number): Promise<ProcessedPhoto> {
  const name = cleanFileName(file.originalname) || `photo ${index + 1}`;
  const input = () => sharp(file.buffer, { limitInputPixels: photoLimits.maxInputPixels, failOn: 'error' });
  // The blocks are dropped from what is kept, but megabytes of them are no camera's doing.
  if (jpegMetadataBytes(file.buffer) > photoLimits.maxMetadataBytes) {
    throw refuse(400, index, name, `carries more than ${photoLimits.maxMetadataBytes / 1024 / 1024} MB of metadata (EXIF and other blocks); no camera photo does.`);
  }
  try {
    const metadata = await input().metadata();
    if (!metadata.format || !acceptedFormats.has(metadata.format)) {
      throw refuse(400, index, name, 'not a photo Vialyard keeps (JPEG, PNG, WebP, HEIF, AVIF, TIFF or GIF).');
    }
    // rotate() with no angle applies the EXIF orientation; sharp writes no metadata (GPS included) unless asked.
    const display = await input()
      .rotate()
      .resize({ width: photoLimits.displaySize, height: photoLimits.displaySize, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await sharp(display.data)
      .resize({ width: photoLimits.thumbSize, height: photoLimits.thumbSize, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 72 })
      .toBuffer();
    return { originalName: name, display: display.data, thumb, width: display.info.width, height: display.info.height };
  } catch (error) {
    if (error instanceof AppError) throw error;
    const text = error instanceof Error ? error.message : String(error);
    if (/pixel limit/i.test(text)) {
      throw refuse(413, index, name, `too many pixels (at most ${photoLimits.maxInputPixels / 1_000_000} megapixels).`);
    }
    throw refuse(400, index, name, 'not an image Vialyard can read.');
  }
}

export async function processPhotos(files: { buffer: Buffer; originalname: string }[]): Promise<ProcessedPhoto[]> {
  const processed: ProcessedPhoto[] = [];
  // One at a time: decoding a phone photo takes memory, and a bad file stops the rest.
  for (const [index, file] of files.entries()) processed.push(await processPhoto(file, index));
  return processed;
}
