// Board photos as the server keeps them: the type decided by the bytes (sharp reads the
// header), never by the file name or the declared type; re-encoded as JPEG with no metadata
// (sharp drops EXIF, and with it any GPS location, unless asked to keep it); one thumbnail.
import sharp from 'sharp';
import { photoTypes } from '@/shared/api/photos';
import { AppError } from '../http/errors';

const MAX_SIDE = 2048;
const THUMB_SIDE = 480;
/** Refuse decompression bombs: a small file that decodes to a huge bitmap. */
const MAX_PIXELS = 40_000_000;

const notAnImage = () =>
  new AppError('unsupported_type', 415, 'That file is not a JPEG, PNG or WebP image (the content was checked, not the name)');

export interface ProcessedPhoto {
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

export async function processPhoto(input: Buffer): Promise<ProcessedPhoto> {
  let format: string | undefined;
  try {
    format = (await sharp(input, { limitInputPixels: MAX_PIXELS }).metadata()).format;
  } catch {
    throw notAnImage();
  }
  if (!(photoTypes as readonly string[]).includes(format ?? '')) throw notAnImage();
  // rotate() applies the EXIF orientation before the metadata is dropped, so the photo stays upright.
  const base = () => sharp(input, { limitInputPixels: MAX_PIXELS }).rotate().flatten({ background: '#ffffff' });
  try {
    const { data: full, info } = await base()
      .resize({ width: MAX_SIDE, height: MAX_SIDE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 85, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    const thumb = await base().resize({ width: THUMB_SIDE, height: THUMB_SIDE, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 78 }).toBuffer();
    return { full, thumb, width: info.width, height: info.height };
  } catch {
    throw new AppError('unsupported_type', 415, 'That image could not be read (it may be damaged or truncated)');
  }
}
