import { PHOTO_ACCEPTED_TYPES, PHOTO_DISPLAY_MAX_EDGE, PHOTO_MAX_PIXELS, PHOTO_THUMBNAIL_EDGE } from '@peakwise/shared';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { PhotoRefused } from './photo.errors.js';

/** What is kept of one upload: two WebP images without any metadata. */
export interface ProcessedPhoto {
  display: Buffer;
  thumbnail: Buffer;
  /** Of the display image, px. */
  width: number;
  height: number;
  /** The camera's EXIF record, read before it is stripped (see photo.taken-at.ts). */
  exif: Buffer | undefined;
}

const ACCEPTED: readonly string[] = PHOTO_ACCEPTED_TYPES;
const WEBP_QUALITY = 82;

/**
 * Decides the type from the bytes (never the name or the sender's Content-Type), refuses a pixel
 * flood before decoding, and re-encodes: oriented by its EXIF tag, scaled down, saved as WebP with
 * no EXIF, GPS, XMP or ICC data (sharp writes none unless told to keep it).
 */
export async function processPhoto(name: string, bytes: Buffer): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !ACCEPTED.includes(type.mime)) {
    const found = type ? `a ${type.mime} file` : 'not an image we can read';
    throw new PhotoRefused(415, `“${name}” is ${found}: send a JPEG, PNG or WebP photo.`);
  }
  // The header alone gives the size (no limit here: it is what is checked next); decoding a
  // 400-megapixel image would take gigabytes.
  const meta = await sharp(bytes, { limitInputPixels: false })
    .metadata()
    .catch(() => null);
  if (!meta?.width || !meta.height) {
    throw new PhotoRefused(422, `“${name}” looks like ${type.mime} but could not be read.`);
  }
  const pixels = meta.width * meta.height;
  if (pixels > PHOTO_MAX_PIXELS) {
    const mp = (n: number) => `${Math.round(n / 1e6)} megapixels`;
    throw new PhotoRefused(
      422,
      `“${name}” is ${meta.width} × ${meta.height} px (${mp(pixels)}); a photo may have at most ${mp(PHOTO_MAX_PIXELS)}.`,
    );
  }
  try {
    // limitInputPixels again: a second guard in case the header and the data disagree.
    const base = sharp(bytes, { limitInputPixels: PHOTO_MAX_PIXELS, failOn: 'error' }).rotate();
    const display = await base
      .clone()
      .resize(PHOTO_DISPLAY_MAX_EDGE, PHOTO_DISPLAY_MAX_EDGE, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: WEBP_QUALITY })
      .toBuffer({ resolveWithObject: true });
    const thumbnail = await base
      .clone()
      .resize(PHOTO_THUMBNAIL_EDGE, PHOTO_THUMBNAIL_EDGE, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: WEBP_QUALITY })
      .toBuffer();
    return {
      display: display.data,
      thumbnail,
      width: display.info.width,
      height: display.info.height,
      exif: meta.exif,
    };
  } catch {
    throw new PhotoRefused(422, `“${name}” looks like ${type.mime} but could not be read.`);
  }
}
