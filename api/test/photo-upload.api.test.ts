import {
  PHOTO_MAX_BYTES,
  PHOTOS_MAX_PER_REQUEST,
  type Culture,
  type Feeding,
  type Photo,
  type PhotoListResponse,
  type PhotoUploadResponse,
  type RiseCheck,
} from '@peakwise/shared';
import sharp from 'sharp';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { created, expectError, signUp, type SignedUp } from './helpers.js';
import {
  exifGpsLatitude,
  image,
  jpegTurnedSideways,
  jpegTakenAt,
  jpegWithGps,
  multipart,
  pixelFloodPng,
  type FilePart,
} from './photo.fixtures.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Uploading jar photos: what is accepted, what is refused and why, and what is kept of a photo
// (re-encoded WebP, turned upright, no metadata). Access and deletion: photo-access.api.test.ts.

let t: TestApp;
let bucket: TestBucket;
let theo: SignedUp;
let feeding: Feeding;

beforeAll(async () => {
  bucket = await startTestBucket();
  t = await createTestApp(storageConfig(bucket));
});
afterAll(async () => {
  await t.close();
  await bucket.stop();
});
beforeEach(async () => {
  await resetDatabase(t.db);
  await bucket.clear();
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
  feeding = await created<Feeding>(
    call('POST', `/api/cultures/${culture.id}/feedings`, { starterG: 20, flourG: 40, waterG: 40 }),
  );
});

function call(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown) {
  // Log writes carry an Idempotency-Key (a fresh one: these are first tries).
  const key = method === 'POST' || method === 'PATCH' ? { 'idempotency-key': crypto.randomUUID() } : {};
  return t.app.inject({ method, url, payload: payload as never, headers: { cookie: theo.cookie, ...key } });
}

function upload(url: string, files: FilePart[], headers: Record<string, string> = {}) {
  const body = multipart(files);
  return t.app.inject({
    method: 'POST',
    url,
    payload: body.payload,
    headers: { cookie: theo.cookie, ...body.headers, ...headers },
  });
}

const toFeeding = (files: FilePart[]) => upload(`/api/feedings/${feeding.id}/photos`, files);
const jpeg = (data: Buffer, filename = 'jar.jpg'): FilePart => ({ filename, contentType: 'image/jpeg', data });

async function fetchImage(photo: Photo, variant: 'display' | 'thumbnail' = 'display') {
  const res = await call('GET', variant === 'display' ? photo.displayUrl : photo.thumbnailUrl);
  expect(res.statusCode, res.body).toBe(200);
  return { res, bytes: res.rawPayload };
}

describe('accepted photos', () => {
  it.each([
    ['jpeg', 'image/jpeg', 'jar.jpg'],
    ['png', 'image/png', 'jar.png'],
    ['webp', 'image/webp', 'jar.webp'],
  ] as const)('a %s is stored as a WebP display image and thumbnail', async (format, contentType, filename) => {
    const data = await image(format, 1800, 1350);
    const { items } = await created<PhotoUploadResponse>(toFeeding([{ filename, contentType, data }]));
    expect(items).toHaveLength(1);
    const photo = items[0]!;
    expect(photo).toMatchObject({
      subjectType: 'feeding',
      subjectId: feeding.id,
      feedingId: feeding.id,
      cultureId: feeding.cultureId,
      caption: null,
      // Scaled to 1600 px on the long edge, keeping 4:3.
      width: 1600,
      height: 1200,
    });
    const display = await fetchImage(photo);
    expect(display.res.headers['content-type']).toBe('image/webp');
    expect(display.res.headers['x-content-type-options']).toBe('nosniff');
    expect(display.res.headers['cache-control']).toMatch(/^private, max-age=\d+$/);
    expect(await sharp(display.bytes).metadata()).toMatchObject({ format: 'webp', width: 1600, height: 1200 });
    const thumb = await fetchImage(photo, 'thumbnail');
    expect(await sharp(thumb.bytes).metadata()).toMatchObject({ format: 'webp', width: 320, height: 240 });
    // Keys are random: nothing of the file's name, the baker or the feeding.
    const keys = await bucket.keys();
    expect(keys).toHaveLength(2);
    for (const key of keys) expect(key).toMatch(/^photo\/[0-9a-f-]{36}$/);
  });

  it('several at once, in the order sent; a small image is not enlarged', async () => {
    const files = [jpeg(await image('jpeg', 300, 200), 'a.jpg'), jpeg(await image('jpeg', 200, 300), 'b.jpg')];
    const { items } = await created<PhotoUploadResponse>(toFeeding(files));
    expect(items.map((p) => [p.width, p.height])).toEqual([
      [300, 200],
      [200, 300],
    ]);
    const list = await created<PhotoListResponse>(call('GET', `/api/feedings/${feeding.id}/photos`), 200);
    expect(list.total).toBe(2);
    expect(list.items.map((p) => p.id)).toEqual(items.map((p) => p.id));
  });

  it('on a rise check the photo names its feeding too, and shows in the feeding list', async () => {
    const check = await created<RiseCheck>(call('POST', `/api/feedings/${feeding.id}/rise-checks`, { heightMm: 80 }));
    const { items } = await created<PhotoUploadResponse>(
      upload(`/api/rise-checks/${check.id}/photos`, [jpeg(await image('jpeg', 200, 200))]),
    );
    expect(items[0]).toMatchObject({ subjectType: 'rise-check', subjectId: check.id, feedingId: feeding.id });
    const list = await created<PhotoListResponse>(call('GET', `/api/feedings/${feeding.id}/photos`), 200);
    expect(list.items.map((p) => p.id)).toEqual([items[0]!.id]);
  });

  it('keeps when the camera says it was taken, and the culture’s strip is in that order', async () => {
    const url = `/api/feedings/${feeding.id}/photos`;
    const plain = await created<PhotoUploadResponse>(
      upload(url, [{ filename: 'now.png', contentType: 'image/png', data: await image('png') }]),
    );
    // Taken two days ago at 07:15 in New York (UTC−5 in late November), sent after the other.
    const older = await created<PhotoUploadResponse>(
      upload(url, [
        { filename: 'jar.jpg', contentType: 'image/jpeg', data: await jpegTakenAt('2026:11:28 07:15:00', '-05:00') },
      ]),
    );
    expect(plain.items[0]?.takenAt).toBeNull();
    expect(older.items[0]?.takenAt).toBe('2026-11-28T12:15:00.000Z');
    const strip = await created<PhotoListResponse>(call('GET', `/api/cultures/${feeding.cultureId}/photos`), 200);
    expect(strip.items.map((p) => p.id)).toEqual([older.items[0]?.id, plain.items[0]?.id]);
    // Read back: the stored image has no EXIF left, the time lives in the row only.
    const stored = await t.app.inject({
      method: 'GET',
      url: older.items[0]?.displayUrl ?? '',
      headers: { cookie: theo.cookie },
    });
    expect((await sharp(stored.rawPayload).metadata()).exif).toBeUndefined();
  });

  it('GPS and other EXIF data are gone from what is stored', async () => {
    const data = await jpegWithGps();
    // The test image really carries a position (51° 30′ N) before upload.
    expect(exifGpsLatitude((await sharp(data).metadata()).exif)).toBeCloseTo(51.5, 6);
    const { items } = await created<PhotoUploadResponse>(toFeeding([jpeg(data)]));
    for (const variant of ['display', 'thumbnail'] as const) {
      const { bytes } = await fetchImage(items[0]!, variant);
      const meta = await sharp(bytes).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      // Nor an EXIF or XMP chunk hiding in the WebP container (RIFF chunk names).
      expect(bytes.includes('EXIF')).toBe(false);
      expect(bytes.includes('XMP ')).toBe(false);
    }
  });

  it('the EXIF orientation is applied: a sideways 400 × 200 JPEG is stored upright, 200 × 400', async () => {
    const data = await jpegTurnedSideways();
    expect(await sharp(data).metadata()).toMatchObject({ width: 400, height: 200, orientation: 6 });
    const { items } = await created<PhotoUploadResponse>(toFeeding([jpeg(data)]));
    expect(items[0]).toMatchObject({ width: 200, height: 400 });
    const stored = await sharp((await fetchImage(items[0]!)).bytes).metadata();
    expect(stored).toMatchObject({ width: 200, height: 400 });
    expect(stored.orientation).toBeUndefined();
  });

  it('a retried upload with the same Idempotency-Key stores nothing twice', async () => {
    const body = multipart([jpeg(await image('jpeg', 200, 200))]);
    const send = () =>
      t.app.inject({
        method: 'POST',
        url: `/api/feedings/${feeding.id}/photos`,
        payload: body.payload,
        headers: { cookie: theo.cookie, 'idempotency-key': 'photo-retry-1', ...body.headers },
      });
    const first = await created<PhotoUploadResponse>(send());
    const again = await created<PhotoUploadResponse>(send());
    expect(again).toEqual(first);
    expect(await bucket.keys()).toHaveLength(2);
  });

  it('a caption is set, trimmed, and cleared with null', async () => {
    const { items } = await created<PhotoUploadResponse>(toFeeding([jpeg(await image('jpeg', 200, 200))]));
    const url = `/api/photos/${items[0]!.id}`;
    expect((await created<Photo>(call('PATCH', url, { caption: '  Doubled at 5 h, 24 °C ' }), 200)).caption).toBe(
      'Doubled at 5 h, 24 °C',
    );
    expect((await created<Photo>(call('PATCH', url, { caption: null }), 200)).caption).toBeNull();
    expectError(await call('PATCH', url, { caption: 'x'.repeat(201) }), 400);
    expectError(await call('PATCH', url, {}), 400);
  });
});

describe('refused uploads leave nothing behind', () => {
  afterEach(async () => {
    expect(await bucket.keys()).toEqual([]);
    const rows = await t.db.selectFrom('photo').select('id').execute();
    expect(rows).toEqual([]);
  });

  it('a script renamed .jpg → 415 naming the file', async () => {
    const script = Buffer.from('#!/bin/sh\necho "not a photo"\n');
    const res = await toFeeding([jpeg(script, 'crumb.jpg')]);
    const body = expectError(res, 415);
    expect(body.message).toContain('crumb.jpg');
    expect(body.message).toContain('JPEG, PNG or WebP');
    expect(body.details).toEqual([{ field: 'photos', message: body.message }]);
  });

  it('an SVG (even sent as image/png) → 415', async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>1</script></svg>');
    const res = await toFeeding([{ filename: 'jar.svg', contentType: 'image/png', data: svg }]);
    expect(expectError(res, 415).message).toContain('jar.svg');
  });

  it('a GIF is an image, but not one we keep → 415 naming its type', async () => {
    const gif = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#fff' } })
      .gif()
      .toBuffer();
    const res = await toFeeding([{ filename: 'jar.gif', contentType: 'image/gif', data: gif }]);
    expect(expectError(res, 415).message).toContain('image/gif');
  });

  it('one bad file among good ones refuses the whole upload', async () => {
    const res = await toFeeding([jpeg(await image('jpeg', 100, 100)), jpeg(Buffer.from('nope'), 'bad.jpg')]);
    expect(expectError(res, 415).message).toContain('bad.jpg');
  });

  it(`a file over ${PHOTO_MAX_BYTES / 1024 / 1024} MB → 413, refused by the parser`, async () => {
    // A valid JPEG start padded past the limit: the type check never sees it.
    const big = Buffer.concat([await image('jpeg', 64, 64), Buffer.alloc(PHOTO_MAX_BYTES + 1)]);
    const body = expectError(await toFeeding([jpeg(big, 'huge.jpg')]), 413);
    expect(body.message).toContain('15 MB');
    expect(body.details?.[0]?.field).toBe('photos');
  });

  it('a pixel flood (a 20000 × 20000 px PNG of a few kB) → 422 before decoding', async () => {
    const flood = pixelFloodPng(20_000);
    expect(flood.length).toBeLessThan(100_000);
    const res = await toFeeding([{ filename: 'flood.png', contentType: 'image/png', data: flood }]);
    const body = expectError(res, 422);
    expect(body.message).toContain('flood.png');
    expect(body.message).toContain('20000 × 20000 px');
  });

  it(`more than ${PHOTOS_MAX_PER_REQUEST} files → 400`, async () => {
    const one = jpeg(await image('jpeg', 32, 32));
    const res = await toFeeding(Array.from({ length: PHOTOS_MAX_PER_REQUEST + 1 }, () => one));
    const body = expectError(res, 400);
    expect(body.details).toEqual([
      { field: 'photos', message: `Send at most ${PHOTOS_MAX_PER_REQUEST} photos at once.` },
    ]);
  });

  it('no file, or a file in another field → 400 naming "photos"', async () => {
    const empty = await call('POST', `/api/feedings/${feeding.id}/photos`, {});
    expect(expectError(empty, 400).details?.[0]?.field).toBe('photos');
    const other = await toFeeding([{ ...jpeg(await image('jpeg', 32, 32)), field: 'file' }]);
    expect(expectError(other, 400).details?.[0]?.field).toBe('photos');
  });

  it('someone else’s feeding → 404, as for an id that does not exist', async () => {
    const ines = await signUp(t.app, { displayName: 'Ines Marlow' });
    const body = multipart([jpeg(await image('jpeg', 32, 32))]);
    const res = await t.app.inject({
      method: 'POST',
      url: `/api/feedings/${feeding.id}/photos`,
      payload: body.payload,
      headers: { cookie: ines.cookie, ...body.headers },
    });
    expectError(res, 404);
  });
});
