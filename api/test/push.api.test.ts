import type {
  Alert,
  AlertListResponse,
  Culture,
  PushDevice,
  PushDeviceListResponse,
  PushPublicKey,
} from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakePush, type FakePush, type FakePushMessage } from '../src/dev/fake-push.js';
import type { FakeSmtp } from '../src/dev/fake-smtp.js';
import { topicOf } from '../src/push/push.sender.js';
import { expectError, expectFieldErrors, send, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Web push end to end against the local fake push service: it checks the VAPID signature
// (RFC 8292), decrypts the aes128gcm body (RFC 8291) with the device keys it handed out, and keeps
// what arrived. The worker polls every 0.5 s; a lead of 240 min makes a feeding's ready alert due now.

let t: TestApp;
let mailbox: FakeSmtp;
let pushService: FakePush;
beforeAll(async () => {
  mailbox = await startTestMailbox();
  pushService = await startFakePush({ port: 0 });
  t = await createTestApp({
    alertPollingSeconds: 0.5,
    ...mailConfig(mailbox),
    push: { subject: 'mailto:test@peakwise.invalid', extraCa: pushService.certificate, allowPrivateEndpoints: true },
  });
});
afterAll(async () => {
  await t.close();
  await pushService.close();
  await mailbox.close();
});

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  mailbox.clear();
  pushService.clear();
  theo = await signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' });
});

const HOUR = 3_600_000;
const call = (method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown, as = theo) =>
  send(t.app, method, url, as.cookie, payload);

async function ok<T>(res: Promise<InjectResponse>, status = 200): Promise<T> {
  const r = await res;
  expect(r.statusCode, r.body).toBe(status);
  return r.json<T>();
}

async function until<T>(probe: () => Promise<T> | T, done: (v: T) => boolean, timeoutMs = 15_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (done(value) || Date.now() > end) return value;
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function registerDevice(as = theo): Promise<{ device: PushDevice; endpoint: string }> {
  const sub = pushService.newDevice();
  const device = await ok<PushDevice>(
    call('POST', '/api/push/subscriptions', { endpoint: sub.endpoint, keys: sub.keys }, as),
    201,
  );
  return { device, endpoint: sub.endpoint };
}

async function feedSoon(as = theo): Promise<Culture> {
  await ok(call('PATCH', '/api/account/alert-preferences', { leadMinutes: 240 }, as));
  const culture = await ok<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }, as), 201);
  await ok(
    call(
      'POST',
      `/api/cultures/${culture.id}/feedings`,
      { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24, fedAt: new Date(Date.now() - 2 * HOUR).toISOString() },
      as,
    ),
    201,
  );
  return culture;
}

describe('the VAPID key', () => {
  it('is made once, kept in the database, and the same for a second API process', async () => {
    const first = await ok<PushPublicKey>(call('GET', '/api/push/key'));
    expect(Buffer.from(first.publicKey, 'base64url')).toHaveLength(65); // uncompressed P-256 point
    const second = await createTestApp({ sessionSecret: t.config.sessionSecret });
    try {
      const again = await ok<PushPublicKey>(send(second.app, 'GET', '/api/push/key', theo.cookie));
      expect(again.publicKey).toBe(first.publicKey);
    } finally {
      await second.close();
    }
  });

  it('needs a signed-in account', async () => {
    expectError(await send(t.app, 'GET', '/api/push/key', null), 401);
  });
});

describe('a feeding whose ready window starts now', () => {
  it('reaches the app, the mailbox and the device once each; the push decrypts to the alert', async () => {
    const { endpoint } = await registerDevice();
    const culture = await feedSoon();
    const pushes = await until(
      () => pushService.messages(),
      (m) => m.length >= 1,
    );
    expect(pushes).toHaveLength(1);
    const [push] = pushes as [FakePushMessage];
    expect(endpoint.endsWith(push.deviceId)).toBe(true);
    expect(push.payload).toEqual({
      title: 'Bramble will be ready soon',
      body: expect.any(String) as unknown,
      url: `/cultures/${culture.id}`,
      tag: expect.stringContaining(culture.id) as unknown,
    });
    expect(push.topic).toBe(topicOf((push.payload as { tag: string }).tag));
    expect(push.urgency).toBe('high');
    expect(push.ttl).toBeGreaterThan(0);
    expect(push.vapidKey).toBe((await ok<PushPublicKey>(call('GET', '/api/push/key'))).publicKey);

    const alerts = await until(
      async () => (await ok<AlertListResponse>(call('GET', '/api/alerts'))).items,
      (items: Alert[]) => items.length >= 1,
    );
    expect(alerts).toHaveLength(1);
    expect(
      await until(
        () => mailbox.messages(),
        (m) => m.length >= 1,
      ),
    ).toHaveLength(1);

    const sent = await t.db.selectFrom('alertDelivery').select(['channel']).where('sentAt', 'is not', null).execute();
    expect(sent.map((d) => d.channel).sort()).toEqual(['email', 'in-app', 'push']);
    const [device] = (await ok<PushDeviceListResponse>(call('GET', '/api/push/subscriptions'))).items;
    expect(device?.lastSentAt).not.toBeNull();
    // A wait after the sends: nothing more arrives.
    await new Promise((r) => setTimeout(r, 1500));
    expect(pushService.messages()).toHaveLength(1);
  });

  it('quiet hours hold the push like the e-mail; the app still shows the alert', async () => {
    await registerDevice();
    const now = Date.now();
    const hhmm = (ms: number) => new Date(ms).toISOString().slice(11, 16);
    await ok(
      call('PATCH', '/api/account/alert-preferences', {
        quietHours: { from: hhmm(now - HOUR), until: hhmm(now + 0.5 * HOUR) },
      }),
    );
    await feedSoon();
    await until(
      async () => (await ok<AlertListResponse>(call('GET', '/api/alerts'))).items,
      (items: Alert[]) => items.length >= 1,
    );
    // Claimed by the worker and given back with the end of the quiet hours as its time.
    const push = await until(
      () =>
        t.db
          .selectFrom('alertDelivery as d')
          .innerJoin('alert as a', 'a.id', 'd.alertId')
          .selectAll('d')
          .where('d.channel', '=', 'push')
          .where('a.kind', '=', 'culture-ready')
          .executeTakeFirstOrThrow(),
      (d) => d.attempts > 0 && d.claimedAt === null,
    );
    expect(push.sentAt).toBeNull();
    expect(push.droppedAt).toBeNull();
    expect(push.sendAfter.getTime()).toBeGreaterThan(now + 0.4 * HOUR);
    expect(pushService.messages()).toHaveLength(0);
  });

  it('without a device no push is planned; turning one on plans it for the alert already pending', async () => {
    await feedSoon(); // no device yet
    await until(
      async () => (await ok<AlertListResponse>(call('GET', '/api/alerts'))).items,
      (items: Alert[]) => items.length >= 1,
    );
    const pushRows = () =>
      t.db
        .selectFrom('alertDelivery as d')
        .innerJoin('alert as a', 'a.id', 'd.alertId')
        .select(['a.kind', 'd.sentAt', 'd.droppedAt'])
        .where('d.channel', '=', 'push')
        .execute();
    expect(await pushRows()).toEqual([]);

    // The feeding-due alert still lies ahead: a device turned on now gets it planned.
    await registerDevice();
    const planned = await pushRows();
    expect(planned.map((r) => r.kind)).toContain('feeding-due');
    expect(planned.every((r) => r.sentAt === null && r.droppedAt === null)).toBe(true);
  });

  it('push switched off for the kind: nothing is pushed, the app and e-mail still go', async () => {
    await registerDevice();
    await ok(call('PATCH', '/api/account/alert-preferences', { channels: { 'culture-ready': { push: false } } }));
    await feedSoon();
    expect(
      await until(
        () => mailbox.messages(),
        (m) => m.length >= 1,
      ),
    ).toHaveLength(1);
    await new Promise((r) => setTimeout(r, 1000));
    expect(pushService.messages()).toHaveLength(0);
  });
});

describe('devices', () => {
  it('a device the push service reports gone (410) is forgotten at the next send', async () => {
    const { device, endpoint } = await registerDevice();
    pushService.removeDevice(endpoint);
    const test = await ok<{ delivered: boolean; problem?: string }>(
      call('POST', `/api/push/subscriptions/${device.id}/test`),
    );
    expect(test.delivered).toBe(false);
    expect(test.problem).toMatch(/ended this subscription/);
    expect((await ok<PushDeviceListResponse>(call('GET', '/api/push/subscriptions'))).items).toEqual([]);
  });

  it('"send a test" reaches the device; the same browser subscribing as someone else moves to them', async () => {
    const { device } = await registerDevice();
    expect(await ok(call('POST', `/api/push/subscriptions/${device.id}/test`))).toEqual({ delivered: true });
    expect(pushService.messages()[0]?.payload).toMatchObject({ url: '/account/alerts' });

    const sub = pushService.newDevice();
    await ok(call('POST', '/api/push/subscriptions', { endpoint: sub.endpoint, keys: sub.keys }), 201);
    const mira = await signUp(t.app, { displayName: 'Mira Sol' });
    await ok(call('POST', '/api/push/subscriptions', { endpoint: sub.endpoint, keys: sub.keys }, mira), 201);
    const theirs = await ok<PushDeviceListResponse>(call('GET', '/api/push/subscriptions', undefined, mira));
    const mine = await ok<PushDeviceListResponse>(call('GET', '/api/push/subscriptions'));
    expect(theirs.items).toHaveLength(1);
    expect(mine.items.map((d) => d.id)).toEqual([device.id]);
  });

  it("another baker's device answers 404; removing mine stops its pushes", async () => {
    const { device } = await registerDevice();
    const mira = await signUp(t.app, { displayName: 'Mira Sol' });
    expectError(await call('DELETE', `/api/push/subscriptions/${device.id}`, undefined, mira), 404);
    expectError(await call('POST', `/api/push/subscriptions/${device.id}/test`, undefined, mira), 404);
    expect((await call('DELETE', `/api/push/subscriptions/${device.id}`)).statusCode).toBe(204);
    await feedSoon();
    await until(
      async () => (await ok<AlertListResponse>(call('GET', '/api/alerts'))).items,
      (items: Alert[]) => items.length >= 1,
    );
    expect(pushService.messages()).toHaveLength(0);
  });

  it('bad subscriptions get field-named 400s and nothing is stored', async () => {
    const sub = pushService.newDevice();
    expectFieldErrors(
      await call('POST', '/api/push/subscriptions', {
        endpoint: sub.endpoint.replace('https:', 'http:'),
        keys: sub.keys,
      }),
      ['endpoint'],
    );
    expectFieldErrors(
      await call('POST', '/api/push/subscriptions', { endpoint: sub.endpoint, keys: { p256dh: 'short', auth: '!' } }),
      ['keys.p256dh', 'keys.auth'],
    );
    expectFieldErrors(await call('POST', '/api/push/subscriptions', { endpoint: 42 }), ['endpoint', 'keys']);
    expect(await t.db.selectFrom('pushSubscription').select('id').execute()).toEqual([]);
  });
});
