import { randomUUID } from 'node:crypto';
import type { Culture, Feeding, PhotoUploadResponse } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { created, expectError, freshKey, signUp, type SignedUp } from './helpers.js';
import { image, multipart } from './photo.fixtures.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Photo uploads (multipart) honour an Idempotency-Key but do not require one. The fingerprint of
// an upload covers its files' bytes, not only the (empty) JSON body, so another photo under the
// same key is refused instead of answered with the first photo.

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
  const post = (url: string, payload: object) =>
    t.app.inject({ method: 'POST', url, payload, headers: { cookie: theo.cookie, ...freshKey() } });
  const culture = await created<Culture>(post('/api/cultures', { name: 'Bramble' }));
  feeding = await created<Feeding>(
    post(`/api/cultures/${culture.id}/feedings`, { starterG: 20, flourG: 40, waterG: 40 }),
  );
});

function upload(data: Buffer, key?: string) {
  const body = multipart([{ filename: 'jar.jpg', contentType: 'image/jpeg', data }]);
  return t.app.inject({
    method: 'POST',
    url: `/api/feedings/${feeding.id}/photos`,
    payload: body.payload,
    headers: { cookie: theo.cookie, ...body.headers, ...(key === undefined ? {} : { 'idempotency-key': key }) },
  });
}

const photoCount = async () => (await t.db.selectFrom('photo').select('id').execute()).length;

describe('a photo upload', () => {
  it('is stored without a key', async () => {
    await created<PhotoUploadResponse>(upload(await image('jpeg', 120, 90)));
    expect(await photoCount()).toBe(1);
  });

  it('with a key: the same photo again is a replay, another photo under that key a 422', async () => {
    const key = randomUUID();
    const jar = await image('jpeg', 120, 90);
    const first = await upload(jar, key);
    expect(first.statusCode, first.body).toBe(201);
    const again = await upload(jar, key);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toBe(first.body);

    const other = await upload(await image('jpeg', 90, 120), key);
    expect(expectError(other, 422).details).toEqual([
      { field: 'Idempotency-Key', message: 'Already used for a different request.' },
    ]);
    expect(await photoCount()).toBe(1);
    expect(await bucket.keys()).toHaveLength(2); // one display image and one thumbnail
  });
});
