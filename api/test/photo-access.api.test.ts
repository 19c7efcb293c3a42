import type { Photo, PhotoListResponse, PhotoUploadResponse, RiseCheck } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PhotoStorage } from '../src/photo/photo.storage.js';
import { PhotoTrash } from '../src/photo/photo.trash.js';
import { leaveClass } from './classroom.fixtures.js';
import { callAs, commentWorld, type Call, type CommentWorld } from './comment.fixtures.js';
import { created, expectError, PASSWORD, type SignedUp } from './helpers.js';
import { image, multipart } from './photo.fixtures.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Who may see a photo (the log's owner, or the instructor of a class the owner is a current member
// of; anyone else 404), and deletion that deletes: after a photo, a rise check, a feeding, a bake
// plan, a culture or an account goes, its images are gone from the bucket too.

let t: TestApp;
let bucket: TestBucket;
let call: Call;
let w: CommentWorld;
let jpeg: Buffer;

beforeAll(async () => {
  bucket = await startTestBucket();
  t = await createTestApp(storageConfig(bucket));
  call = callAs(t);
  jpeg = await image('jpeg', 120, 90);
});
afterAll(async () => {
  await t.close();
  await bucket.stop();
});
beforeEach(async () => {
  await resetDatabase(t.db);
  await bucket.clear();
  // Theo (a student of Ines in "Weekend Levain") owns Bramble, a feeding and a bake plan; Olwen
  // teaches a class Theo is not in; Amara is a fellow student.
  w = await commentWorld(t);
});

async function upload(url: string, count = 1, as: SignedUp = w.theo): Promise<Photo[]> {
  const body = multipart(
    Array.from({ length: count }, (_, i) => ({ filename: `jar-${i}.jpg`, contentType: 'image/jpeg', data: jpeg })),
  );
  const res = await t.app.inject({
    method: 'POST',
    url,
    payload: body.payload,
    headers: { cookie: as.cookie, ...body.headers },
  });
  return (await created<PhotoUploadResponse>(res)).items;
}

const riseCheck = () =>
  created<RiseCheck>(call('POST', `/api/feedings/${w.feeding.id}/rise-checks`, w.theo, { heightMm: 90 }));
const keysOf = (photos: Photo[]) =>
  t.db
    .selectFrom('photo')
    .select(['displayKey', 'thumbnailKey'])
    .where(
      'id',
      'in',
      photos.map((p) => p.id),
    )
    .execute()
    .then((rows) => rows.flatMap((r) => [r.displayKey, r.thumbnailKey]).sort());

describe('who sees a photo', () => {
  it('the owner and the class instructor see it; another baker and a fellow student get 404', async () => {
    const [photo] = await upload(`/api/feedings/${w.feeding.id}/photos`);
    for (const url of [photo!.displayUrl, photo!.thumbnailUrl]) {
      expect((await call('GET', url, w.theo)).statusCode).toBe(200);
      const asInstructor = await call('GET', url, w.ines);
      expect(asInstructor.statusCode).toBe(200);
      expect(asInstructor.headers['content-type']).toBe('image/webp');
      expectError(await call('GET', url, w.olwen), 404);
      expectError(await call('GET', url, w.amara), 404);
    }
    // The same answer as for a photo that never existed.
    const missing = await call('GET', '/api/photos/00000000-0000-4000-8000-000000000000/display', w.olwen);
    expect(expectError(missing, 404).message).toBe(
      expectError(await call('GET', photo!.displayUrl, w.olwen), 404).message,
    );
    for (const url of [`/api/feedings/${w.feeding.id}/photos`, `/api/cultures/${w.culture.id}/photos`]) {
      expect((await created<PhotoListResponse>(call('GET', url, w.ines), 200)).total).toBe(1);
      expectError(await call('GET', url, w.olwen), 404);
    }
  });

  it('only the owner captions, deletes or adds; the instructor gets 404 like anyone else', async () => {
    const [photo] = await upload(`/api/plans/${w.plan.id}/photos`);
    expectError(await call('PATCH', `/api/photos/${photo!.id}`, w.ines, { caption: 'Open crumb' }), 404);
    expectError(await call('DELETE', `/api/photos/${photo!.id}`, w.ines), 404);
    const body = multipart([{ filename: 'x.jpg', contentType: 'image/jpeg', data: jpeg }]);
    const res = await t.app.inject({
      method: 'POST',
      url: `/api/plans/${w.plan.id}/photos`,
      payload: body.payload,
      headers: { cookie: w.ines.cookie, ...body.headers },
    });
    expectError(res, 404);
    expect((await created<PhotoListResponse>(call('GET', `/api/plans/${w.plan.id}/photos`, w.ines), 200)).total).toBe(
      1,
    );
  });

  it('once the student leaves the class, the instructor gets 404', async () => {
    const [photo] = await upload(`/api/feedings/${w.feeding.id}/photos`);
    expect((await call('GET', photo!.displayUrl, w.ines)).statusCode).toBe(200);
    await leaveClass(t.db, w.classId, w.theo.account.id);
    expectError(await call('GET', photo!.displayUrl, w.ines), 404);
    expectError(await call('GET', `/api/cultures/${w.culture.id}/photos`, w.ines), 404);
  });

  it("a culture's strip: its feedings' and rise checks' photos oldest first, not its bakes'", async () => {
    const first = await upload(`/api/feedings/${w.feeding.id}/photos`);
    const check = await riseCheck();
    const second = await upload(`/api/rise-checks/${check.id}/photos`);
    await upload(`/api/plans/${w.plan.id}/photos`);
    const strip = await created<PhotoListResponse>(call('GET', `/api/cultures/${w.culture.id}/photos`, w.theo), 200);
    expect(strip.items.map((p) => [p.id, p.subjectType])).toEqual([
      [first[0]!.id, 'feeding'],
      [second[0]!.id, 'rise-check'],
    ]);
  });
});

describe('deletion that deletes', () => {
  it('deleting a photo removes both its images, and only those', async () => {
    const [gone, kept] = await upload(`/api/feedings/${w.feeding.id}/photos`, 2);
    const keptKeys = await keysOf([kept!]);
    expect(await bucket.keys()).toHaveLength(4);
    expect((await call('DELETE', `/api/photos/${gone!.id}`, w.theo)).statusCode).toBe(204);
    expect(await bucket.keys()).toEqual(keptKeys);
    expectError(await call('GET', gone!.displayUrl, w.theo), 404);
  });

  it('deleting a rise check removes its photos, not its feeding’s', async () => {
    const feedingKeys = await keysOf(await upload(`/api/feedings/${w.feeding.id}/photos`));
    const check = await riseCheck();
    await upload(`/api/rise-checks/${check.id}/photos`, 2);
    expect(await bucket.keys()).toHaveLength(6);
    expect((await call('DELETE', `/api/rise-checks/${check.id}`, w.theo)).statusCode).toBe(204);
    expect(await bucket.keys()).toEqual(feedingKeys);
  });

  it('deleting a feeding removes its photos and its rise checks’ photos', async () => {
    await upload(`/api/feedings/${w.feeding.id}/photos`);
    await upload(`/api/rise-checks/${(await riseCheck()).id}/photos`);
    expect(await bucket.keys()).toHaveLength(4);
    expect((await call('DELETE', `/api/feedings/${w.feeding.id}`, w.theo)).statusCode).toBe(204);
    expect(await bucket.keys()).toEqual([]);
  });

  it('deleting a bake plan removes its photos', async () => {
    await upload(`/api/plans/${w.plan.id}/photos`, 2);
    expect((await call('DELETE', `/api/plans/${w.plan.id}`, w.theo)).statusCode).toBe(204);
    expect(await bucket.keys()).toEqual([]);
  });

  it('deleting a culture removes every photo of its log', async () => {
    await upload(`/api/feedings/${w.feeding.id}/photos`, 2);
    await upload(`/api/rise-checks/${(await riseCheck()).id}/photos`);
    expect(await bucket.keys()).toHaveLength(6);
    expect((await call('DELETE', `/api/cultures/${w.culture.id}`, w.theo)).statusCode).toBe(204);
    expect(await bucket.keys()).toEqual([]);
  });

  it('deleting an account (its password again) removes every photo it kept, and the session ends', async () => {
    await upload(`/api/feedings/${w.feeding.id}/photos`);
    await upload(`/api/plans/${w.plan.id}/photos`);
    expect(await bucket.keys()).toHaveLength(4);
    // Without a session: 401. With the wrong password: 400. Neither changes anything.
    expectError(
      await t.app.inject({ method: 'POST', url: '/api/account/delete', payload: { password: PASSWORD } }),
      401,
    );
    const wrong = await call('POST', '/api/account/delete', w.theo, { password: 'not my password at all' });
    expect(expectError(wrong, 400).details).toEqual([{ field: 'password', message: 'This is not your password.' }]);
    expect(await bucket.keys()).toHaveLength(4);

    const gone = await call('POST', '/api/account/delete', w.theo, { password: PASSWORD });
    expect(gone.statusCode, gone.body).toBe(204);
    expect(String(gone.headers['set-cookie'])).toMatch(/peakwise\.sid=;/);
    expect(await bucket.keys()).toEqual([]);
    expect(await t.db.selectFrom('photoObjectTrash').select('objectKey').execute()).toEqual([]);
    expect(await t.db.selectFrom('account').select('id').where('id', '=', w.theo.account.id).execute()).toEqual([]);
    expect(await t.db.selectFrom('culture').select('id').where('id', '=', w.culture.id).execute()).toEqual([]);
    // The captured cookie opens nothing any more.
    expectError(await call('GET', '/api/account', w.theo), 401);
  });

  it('when the store is unreachable the delete still succeeds, and the sweep removes the images later', async () => {
    await upload(`/api/feedings/${w.feeding.id}/photos`);
    const down = await createTestApp({
      // The same cookie opens the same session in this second app, whose store is gone.
      sessionSecret: t.config.sessionSecret,
      storage: { ...storageConfig(bucket).storage!, endpoint: 'http://127.0.0.1:9' },
    });
    try {
      expect((await callAs(down)('DELETE', `/api/feedings/${w.feeding.id}`, w.theo)).statusCode).toBe(204);
    } finally {
      await down.close();
    }
    expect(await bucket.keys()).toHaveLength(2);
    expect(await t.db.selectFrom('photoObjectTrash').select('objectKey').execute()).toHaveLength(2);
    await t.app.get(PhotoTrash).sweep();
    expect(await bucket.keys()).toEqual([]);
  });

  it('the sweep removes objects no photo names (an upload that died before its rows), past a grace period', async () => {
    const live = await keysOf(await upload(`/api/feedings/${w.feeding.id}/photos`));
    const storage = t.app.get(PhotoStorage);
    const stray = storage.newKey();
    await storage.put(stray, jpeg, 'image/jpeg');
    // Young objects may belong to an upload in flight: left alone.
    expect(await t.app.get(PhotoTrash).sweep(60 * 60 * 1000)).toBe(0);
    expect(await bucket.keys()).toEqual([...live, stray].sort());
    expect(await t.app.get(PhotoTrash).sweep(0)).toBe(1);
    expect(await bucket.keys()).toEqual(live);
  });
});
