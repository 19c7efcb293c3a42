import { EARLIEST_LOG_TIME, instantAtLocal } from '@peakwise/shared';
import exifReader from 'exif-reader';

const OFFSET = /^([+-])(\d{2}):(\d{2})$/;
const DAY = 86_400_000;

/**
 * When the camera says the photo was taken, read before the metadata is stripped: EXIF
 * DateTimeOriginal (a wall-clock time; exif-reader hands it over as if it were UTC) with its
 * OffsetTimeOriginal when the camera wrote one (EXIF 2.31 and later), else read in the baker's
 * zone. Null when the file has no such record, or a clearly wrong one (unset camera clocks give
 * years like 1970 or a date in the future).
 */
export function photoTakenAt(exif: Buffer | undefined, timeZone: string, nowMs: number): Date | null {
  if (!exif) return null;
  let photo: { DateTimeOriginal?: unknown; OffsetTimeOriginal?: unknown } | undefined;
  try {
    photo = exifReader(exif).Photo;
  } catch {
    return null;
  }
  const wall = photo?.DateTimeOriginal;
  if (!(wall instanceof Date) || Number.isNaN(wall.getTime())) return null;
  const offset = typeof photo?.OffsetTimeOriginal === 'string' ? OFFSET.exec(photo.OffsetTimeOriginal) : null;
  const ms = offset
    ? wall.getTime() - (offset[1] === '-' ? -1 : 1) * (Number(offset[2]) * 60 + Number(offset[3])) * 60_000
    : instantAtLocal(
        wall.getUTCFullYear(),
        wall.getUTCMonth() + 1,
        wall.getUTCDate(),
        wall.getUTCHours(),
        wall.getUTCMinutes(),
        timeZone,
      ) +
      wall.getUTCSeconds() * 1000;
  if (ms < Date.parse(EARLIEST_LOG_TIME) || ms > nowMs + DAY) return null;
  return new Date(ms);
}
