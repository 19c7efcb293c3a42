import { createServer, type Server, type Socket } from 'node:net';
import { connect } from 'node:net';
import type { Culture, FeedingListResponse } from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { durabilityProblems } from '../src/db/durability.js';
import { created, expectError, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, testConfig, type TestApp } from './test-app.js';

// The database going away under a running API: a TCP relay between the API and PostgreSQL is cut
// and restored. While it is cut every request gets 503 with Retry-After in the error shape; once
// it is back the API answers again without a restart, and a write retried with its
// Idempotency-Key is stored once.

interface Relay {
  port: number;
  cut(): void;
  restore(): void;
  close(): Promise<void>;
}

async function startRelay(target: { host: string; port: number }): Promise<Relay> {
  const sockets = new Set<Socket>();
  let open = true;
  const server: Server = createServer((client) => {
    if (!open) return client.destroy();
    const upstream = connect(target.port, target.host);
    for (const s of [client, upstream]) {
      sockets.add(s);
      s.on('close', () => sockets.delete(s));
      s.on('error', () => s.destroy());
    }
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  if (!address || typeof address === 'string') throw new Error('no port');
  return {
    port: address.port,
    cut() {
      open = false;
      for (const s of sockets) s.destroy();
    },
    restore() {
      open = true;
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

function relayed(url: string, port: number): string {
  const u = new URL(url);
  u.hostname = '127.0.0.1';
  u.port = String(port);
  return u.toString();
}

describe('while the database is unreachable', () => {
  let t: TestApp;
  let relay: Relay;
  let theo: SignedUp;
  let culture: Culture;

  beforeAll(async () => {
    const direct = new URL(testConfig().databaseUrl);
    relay = await startRelay({ host: direct.hostname, port: Number(direct.port || 5432) });
    t = await createTestApp({ databaseUrl: relayed(testConfig().databaseUrl, relay.port) });
    await resetDatabase(t.db);
    theo = await signUp(t.app);
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/cultures',
      headers: { cookie: theo.cookie, 'idempotency-key': crypto.randomUUID() },
      payload: { name: 'Bramble' },
    });
    culture = await created<Culture>(Promise.resolve(res));
  });
  afterAll(async () => {
    relay.restore();
    await t.close();
    await relay.close();
  });

  const feed = (key: string) =>
    t.app.inject({
      method: 'POST',
      url: `/api/cultures/${culture.id}/feedings`,
      headers: { cookie: theo.cookie, 'idempotency-key': key },
      payload: { starterG: 20, flourG: 100, waterG: 100 },
    });

  it('answers 503 with Retry-After, then recovers by itself; the retried write is stored once', async () => {
    relay.cut();
    const key = crypto.randomUUID();
    for (const res of [
      await t.app.inject({ method: 'GET', url: `/api/cultures/${culture.id}`, headers: { cookie: theo.cookie } }),
      await feed(key),
    ]) {
      const body = expectError(res, 503);
      expect(body.message).toMatch(/database cannot be reached/);
      expect(res.headers['retry-after']).toBe('5');
    }

    relay.restore();
    const stored = await feed(key);
    expect(stored.statusCode, stored.body).toBe(201);
    const again = await feed(key);
    expect(again.statusCode).toBe(201);
    expect(again.json()).toEqual(stored.json());
    const list = await t.app.inject({
      method: 'GET',
      url: `/api/cultures/${culture.id}/feedings`,
      headers: { cookie: theo.cookie },
    });
    expect(list.json<FeedingListResponse>().total).toBe(1);
  });
});

describe('durability at start-up', () => {
  it('refuses a database that may lose confirmed writes, unless told it is a throw-away one', async () => {
    const probe = await createTestApp();
    const problems = await durabilityProblems(probe.db);
    await probe.close();
    const strict = createTestApp({ allowUnsafeDurability: false });
    if (problems.length === 0) {
      // A durable database (TEST_DATABASE_URL may name one): the API starts.
      await (await strict).close();
      return;
    }
    // npm test's own cluster runs without fsync.
    await expect(strict).rejects.toThrow(/fsync is off.*ALLOW_UNSAFE_DURABILITY/);
  });
});
