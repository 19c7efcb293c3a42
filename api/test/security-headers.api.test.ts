import { randomUUID } from 'node:crypto';
import type { Culture, Feeding, PhotoUploadResponse } from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { created, expectError, signUp, type SignedUp } from './helpers.js';
import { image, multipart } from './photo.fixtures.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Response headers (OWASP Secure Headers; CSP Level 3; RFC 6797 for HSTS; RFC 9111 for
// Cache-Control) and CORS (Fetch standard: a preflight without Access-Control-Allow-Origin fails).

let t: TestApp;
let bucket: TestBucket;
let theo: SignedUp;
beforeAll(async () => {
  bucket = await startTestBucket();
  t = await createTestApp(storageConfig(bucket));
  await resetDatabase(t.db);
  theo = await signUp(t.app);
});
afterAll(async () => {
  await t.close();
  await bucket.stop();
});

function get(url: string, app = t) {
  return app.app.inject({ method: 'GET', url, headers: { cookie: theo.cookie } });
}

/** `default-src 'self'; …` → Map of directive → its sources. */
function csp(header: unknown): Map<string, string[]> {
  expect(typeof header).toBe('string');
  const directives = new Map<string, string[]>();
  for (const part of (header as string).split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) directives.set(name, sources);
  }
  return directives;
}

describe('Content-Security-Policy', () => {
  it('is strict: no plugins, no <base>, no framing, forms only to us, scripts only from our files', async () => {
    const policy = csp((await get('/api/account')).headers['content-security-policy']);
    expect(policy.get('default-src')).toEqual(["'self'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('base-uri')).toEqual(["'none'"]);
    expect(policy.get('frame-ancestors')).toEqual(["'none'"]);
    expect(policy.get('form-action')).toEqual(["'self'"]);
    expect(policy.get('script-src')).toEqual(["'self'"]);
    expect(policy.get('script-src-attr')).toEqual(["'none'"]);
    // emotion (MUI) inserts <style> at run time; styles only, never script.
    expect(policy.get('style-src')).toEqual(["'self'", "'unsafe-inline'"]);
    expect(policy.get('connect-src')).toEqual(["'self'"]);
    for (const sources of policy.values()) {
      expect(sources).not.toContain("'unsafe-eval'");
      expect(sources).not.toContain('*');
    }
  });

  it('is sent on refusals and unknown routes too', async () => {
    const missing = await t.app.inject({ method: 'GET', url: '/api/no-such-route' });
    expectError(missing, 404);
    expect(csp(missing.headers['content-security-policy']).get('frame-ancestors')).toEqual(["'none'"]);
  });
});

describe('other headers', () => {
  it('nosniff, no referrer, no framing, and no HSTS over plain http', async () => {
    const res = await get('/api/account');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-frame-options']).toBe('DENY');
    expect(res.headers['strict-transport-security']).toBeUndefined();
  });

  it('HSTS once the public URL is https (TLS ends at a proxy in front of us)', async () => {
    const behindTls = await createTestApp({ mail: { ...t.config.mail, publicUrl: 'https://peakwise.example' } });
    try {
      const res = await behindTls.app.inject({ method: 'GET', url: '/api/health' });
      expect(res.headers['strict-transport-security']).toBe('max-age=31536000; includeSubDomains');
    } finally {
      await behindTls.close();
    }
  });
});

describe('behind a proxy (TRUST_PROXY)', () => {
  it('sends HSTS when the trusted proxy says the request came over https, and only then', async () => {
    const proxied = await createTestApp({ trustProxy: true });
    const direct = await createTestApp();
    try {
      const forwarded = { 'x-forwarded-proto': 'https' };
      const viaTls = await proxied.app.inject({ method: 'GET', url: '/api/health', headers: forwarded });
      expect(viaTls.headers['strict-transport-security']).toBe('max-age=31536000; includeSubDomains');
      const viaHttp = await proxied.app.inject({ method: 'GET', url: '/api/health' });
      expect(viaHttp.headers['strict-transport-security']).toBeUndefined();
      // Without TRUST_PROXY the header is anyone's to send, so it is ignored.
      const spoofed = await direct.app.inject({ method: 'GET', url: '/api/health', headers: forwarded });
      expect(spoofed.headers['strict-transport-security']).toBeUndefined();
    } finally {
      await proxied.close();
      await direct.close();
    }
  });
});

describe('Cache-Control', () => {
  it('no-store on signed-in JSON, on errors and on CSV exports', async () => {
    const me = await get('/api/account');
    expect(me.statusCode).toBe(200);
    expect(me.headers['cache-control']).toBe('no-store');
    const unauthorised = await t.app.inject({ method: 'GET', url: '/api/account' });
    expectError(unauthorised, 401);
    expect(unauthorised.headers['cache-control']).toBe('no-store');
    const culture = await created<Culture>(
      t.app.inject({
        method: 'POST',
        url: '/api/cultures',
        headers: { cookie: theo.cookie, 'idempotency-key': randomUUID() },
        payload: { name: 'Bramble' },
      }),
    );
    const csv = await get(`/api/cultures/${culture.id}/export.csv`);
    expect(csv.statusCode).toBe(200);
    expect(csv.headers['cache-control']).toBe('no-store');
  });

  it("keeps the photo image route's own private caching", async () => {
    const culture = await created<Culture>(
      t.app.inject({
        method: 'POST',
        url: '/api/cultures',
        headers: { cookie: theo.cookie, 'idempotency-key': randomUUID() },
        payload: { name: 'Rye' },
      }),
    );
    const feeding = await created<Feeding>(
      t.app.inject({
        method: 'POST',
        url: `/api/cultures/${culture.id}/feedings`,
        headers: { cookie: theo.cookie, 'idempotency-key': randomUUID() },
        payload: { starterG: 20, flourG: 40, waterG: 40 },
      }),
    );
    const body = multipart([{ filename: 'jar.jpg', contentType: 'image/jpeg', data: await image('jpeg', 120, 90) }]);
    const { items } = await created<PhotoUploadResponse>(
      t.app.inject({
        method: 'POST',
        url: `/api/feedings/${feeding.id}/photos`,
        headers: { cookie: theo.cookie, 'idempotency-key': randomUUID(), ...body.headers },
        payload: body.payload,
      }),
    );
    const photo = await get(items[0]!.displayUrl);
    expect(photo.statusCode).toBe(200);
    expect(photo.headers['cache-control']).toMatch(/^private, max-age=\d+$/);
  });
});

describe('CORS', () => {
  const preflight = (app: TestApp, origin: string) =>
    app.app.inject({
      method: 'OPTIONS',
      url: '/api/account',
      headers: { origin, 'access-control-request-method': 'PATCH', 'access-control-request-headers': 'content-type' },
    });

  it('is closed by default: a cross-origin preflight and a read get no Access-Control-Allow-Origin', async () => {
    const res = await preflight(t, 'https://evil.example');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    expect(res.headers['access-control-allow-credentials']).toBeUndefined();
    const read = await t.app.inject({
      method: 'GET',
      url: '/api/health',
      headers: { origin: 'https://evil.example' },
    });
    expect(read.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('opens to exactly the origins in CORS_ORIGINS', async () => {
    const open = await createTestApp({ corsOrigins: ['https://app.bakery.test'] });
    try {
      const listed = await preflight(open, 'https://app.bakery.test');
      expect(listed.statusCode).toBe(204);
      expect(listed.headers['access-control-allow-origin']).toBe('https://app.bakery.test');
      expect(listed.headers['access-control-allow-credentials']).toBe('true');
      expect(String(listed.headers['access-control-allow-methods'])).toContain('PATCH');
      const other = await preflight(open, 'https://evil.example');
      expect(other.headers['access-control-allow-origin']).toBeUndefined();
    } finally {
      await open.close();
    }
  });
});
