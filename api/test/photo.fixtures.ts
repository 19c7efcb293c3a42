import { randomBytes } from 'node:crypto';
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';

// Images and multipart bodies for the photo tests, made here so every byte is known: invented
// colours, no real photograph, no real place.

export interface FilePart {
  filename: string;
  contentType: string;
  data: Buffer;
  field?: string;
}

/** A multipart/form-data body as a browser sends it, for app.inject(). */
export function multipart(files: FilePart[]): { payload: Buffer; headers: Record<string, string> } {
  const boundary = `----peakwise${randomBytes(8).toString('hex')}`;
  const parts = files.flatMap((f) => [
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="${f.field ?? 'photos'}"; filename="${f.filename}"\r\n` +
        `Content-Type: ${f.contentType}\r\n\r\n`,
    ),
    f.data,
    Buffer.from('\r\n'),
  ]);
  return {
    payload: Buffer.concat([...parts, Buffer.from(`--${boundary}--\r\n`)]),
    headers: { 'content-type': `multipart/form-data; boundary=${boundary}` },
  };
}

const crumb = { r: 214, g: 196, b: 160 };

/** A small image in `format`, `width` × `height` px, with some texture so encoders have work to do. */
export async function image(format: 'jpeg' | 'png' | 'webp', width = 640, height = 480): Promise<Buffer> {
  const noise = await sharp({
    create: { width, height, channels: 3, background: crumb, noise: { type: 'gaussian', mean: 128, sigma: 30 } },
  })
    .png()
    .toBuffer();
  return sharp(noise).toFormat(format).toBuffer();
}

/** A JPEG whose EXIF places it at 51° 30′ N, 0° 7′ W, like a phone's camera would. */
export function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 320, height: 240, channels: 3, background: crumb } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Peakwise test camera' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer();
}

/** A JPEG whose EXIF says when it was taken (EXIF 2.31 DateTimeOriginal, with OffsetTimeOriginal if given). */
export function jpegTakenAt(dateTimeOriginal: string, offset?: string): Promise<Buffer> {
  return sharp({ create: { width: 320, height: 240, channels: 3, background: crumb } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Peakwise test camera' },
      IFD2: { DateTimeOriginal: dateTimeOriginal, ...(offset ? { OffsetTimeOriginal: offset } : {}) },
    })
    .toBuffer();
}

/** A landscape JPEG (400 × 200 px as stored) whose EXIF says to turn it 90° clockwise (orientation 6). */
export function jpegTurnedSideways(): Promise<Buffer> {
  return sharp({ create: { width: 400, height: 200, channels: 3, background: crumb } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/**
 * A real, valid PNG of `edge` × `edge` px in one colour (1-bit greyscale): a few tens of kB on disk
 * that would take gigabytes to decode — a decompression bomb. Written by hand (PNG spec, ISO/IEC
 * 15948: signature, IHDR, IDAT, IEND with CRC-32) because making it with sharp takes a minute.
 */
export function pixelFloodPng(edge = 20_000): Buffer {
  const rowBytes = 1 + Math.ceil(edge / 8); // filter byte + 1 bit a pixel
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(edge, 0);
  ihdr.writeUInt32BE(edge, 4);
  ihdr.set([1, 0, 0, 0, 0], 8); // bit depth 1, greyscale, deflate, no filter method, no interlace
  const pixels = deflateSync(Buffer.alloc(rowBytes * edge), { level: 9 });
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

function chunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

function crc32(bytes: Buffer): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k++) crc = crc & 1 ? (crc >>> 1) ^ 0xedb88320 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}

/**
 * The GPS latitude in an EXIF block (a TIFF structure: IFD0 → tag 0x8825 → GPS IFD → tag 0x0002,
 * three rationals), in degrees; null when there is none. Enough of TIFF 6.0 / EXIF 2.3 to tell
 * that a test image carries a position, without an EXIF library.
 */
export function exifGpsLatitude(exif: Buffer | undefined): number | null {
  if (!exif) return null;
  const tiff = exif.subarray(
    exif.indexOf('MM') >= 0 && exif.indexOf('MM') < 8 ? exif.indexOf('MM') : exif.indexOf('II'),
  );
  const le = tiff.toString('latin1', 0, 2) === 'II';
  const u16 = (at: number) => (le ? tiff.readUInt16LE(at) : tiff.readUInt16BE(at));
  const u32 = (at: number) => (le ? tiff.readUInt32LE(at) : tiff.readUInt32BE(at));
  const entry = (ifd: number, tag: number): number | null => {
    const count = u16(ifd);
    for (let i = 0; i < count; i++) if (u16(ifd + 2 + i * 12) === tag) return ifd + 2 + i * 12;
    return null;
  };
  const gpsPointer = entry(u32(4), 0x8825);
  if (gpsPointer === null) return null;
  const latitude = entry(u32(gpsPointer + 8), 0x0002);
  if (latitude === null) return null;
  const at = u32(latitude + 8);
  const [d, m, s] = [0, 1, 2].map((i) => u32(at + i * 8) / u32(at + i * 8 + 4)) as [number, number, number];
  return d + m / 60 + s / 3600;
}
