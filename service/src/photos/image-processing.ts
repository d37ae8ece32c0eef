import sharp from 'sharp';

export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
export const PHOTOS_PER_CASE = 30;
export const THUMB_WIDTH = 320;
/** Refuse images that would take more than this many pixels to decode (decompression bombs). */
const MAX_PIXELS = 60_000_000;

const FORMATS = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp' } as const;
export type PhotoFormat = keyof typeof FORMATS;

export class PhotoRejected extends Error {
  constructor(
    public readonly status: 413 | 415 | 400,
    message: string,
  ) {
    super(message);
  }
}

/** The image kind by its first bytes (file signatures), whatever the file name or declared type says. */
export function sniffFormat(buf: Buffer): PhotoFormat | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (buf.length >= 12 && buf.toString('latin1', 0, 4) === 'RIFF' && buf.toString('latin1', 8, 12) === 'WEBP') return 'webp';
  return null;
}

export interface ProcessedPhoto {
  format: PhotoFormat;
  contentType: string;
  body: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

/**
 * Checks the content, turns the picture upright, and re-encodes it without any metadata (no
 * location, camera or time tags survive), plus a small WebP thumbnail.
 */
export async function processPhoto(input: Buffer): Promise<ProcessedPhoto> {
  if (input.length > PHOTO_MAX_BYTES) throw new PhotoRejected(413, `A photo may be at most ${PHOTO_MAX_BYTES / 1024 / 1024} MB.`);
  const format = sniffFormat(input);
  if (!format) throw new PhotoRejected(415, 'Only JPEG, PNG and WebP photos are accepted (checked by content, not by name).');
  let meta: Awaited<ReturnType<ReturnType<typeof sharp>['metadata']>>;
  try {
    meta = await sharp(input, { limitInputPixels: MAX_PIXELS }).metadata();
  } catch {
    throw new PhotoRejected(415, 'This file is not a readable picture.');
  }
  if (meta.format !== format) throw new PhotoRejected(415, 'The picture’s content does not match its kind.');
  try {
    const base = sharp(input, { limitInputPixels: MAX_PIXELS }).rotate();
    const encoded = format === 'jpeg' ? base.jpeg({ quality: 88 }) : format === 'png' ? base.png() : base.webp({ quality: 88 });
    const { data: body, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumb = await sharp(body).resize({ width: THUMB_WIDTH, withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();
    return { format, contentType: FORMATS[format], body, thumb, width: info.width, height: info.height };
  } catch {
    throw new PhotoRejected(415, 'This picture could not be read; it may be damaged.');
  }
}
