import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { photoTakenAt } from './photo.taken-at.js';

// EXIF 2.31/2.32 (CIPA DC-008): DateTimeOriginal "YYYY:MM:DD HH:MM:SS" is the camera's wall
// clock; OffsetTimeOriginal "±HH:MM" is its offset from UTC. Test files are written with sharp.
async function exifOf(photo: Record<string, string>): Promise<Buffer | undefined> {
  const jpeg = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#ddd' } })
    .jpeg()
    .withExif({ IFD0: { Make: 'Test' }, IFD2: photo })
    .toBuffer();
  return (await sharp(jpeg).metadata()).exif;
}

const NOW = Date.parse('2026-12-02T12:00:00Z');

describe('photoTakenAt', () => {
  it('uses the offset the camera wrote', async () => {
    const exif = await exifOf({ DateTimeOriginal: '2026:11:30 07:15:20', OffsetTimeOriginal: '-05:00' });
    expect(photoTakenAt(exif, 'Europe/Berlin', NOW)?.toISOString()).toBe('2026-11-30T12:15:20.000Z');
  });

  it('reads a time without an offset in the baker’s zone (Berlin is UTC+1 in November)', async () => {
    const exif = await exifOf({ DateTimeOriginal: '2026:11:30 07:15:00' });
    expect(photoTakenAt(exif, 'Europe/Berlin', NOW)?.toISOString()).toBe('2026-11-30T06:15:00.000Z');
    expect(photoTakenAt(exif, 'America/New_York', NOW)?.toISOString()).toBe('2026-11-30T12:15:00.000Z');
  });

  it('gives null for no record, an unset camera clock or a date in the future', async () => {
    expect(photoTakenAt(undefined, 'UTC', NOW)).toBeNull();
    expect(photoTakenAt(await exifOf({ ExposureTime: '1/60' }), 'UTC', NOW)).toBeNull();
    expect(photoTakenAt(await exifOf({ DateTimeOriginal: '1970:01:01 00:00:00' }), 'UTC', NOW)).toBeNull();
    expect(photoTakenAt(await exifOf({ DateTimeOriginal: '2027:06:01 10:00:00' }), 'UTC', NOW)).toBeNull();
    expect(photoTakenAt(Buffer.from('not exif'), 'UTC', NOW)).toBeNull();
  });
});
