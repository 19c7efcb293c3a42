import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './test-app.js';

// The built web app as the API serves it: the copies web/scripts/compress-dist.mjs makes are sent
// to browsers that accept them, hashed assets are cached for a year, the page is asked for anew.

let t: TestApp;
const script = 'console.log("peakwise");'.repeat(100);
beforeAll(async () => {
  const dist = mkdtempSync(join(tmpdir(), 'peakwise-dist-'));
  mkdirSync(join(dist, 'assets'));
  writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Peakwise</title>');
  const asset = join(dist, 'assets', 'index-AbC123.js');
  writeFileSync(asset, script);
  writeFileSync(`${asset}.gz`, gzipSync(script));
  writeFileSync(`${asset}.br`, brotliCompressSync(script));
  t = await createTestApp({ webDist: dist });
});
afterAll(() => t.close());

it('sends the brotli or gzip copy to a browser that takes it, the plain file otherwise', async () => {
  const url = '/assets/index-AbC123.js';
  const br = await t.app.inject({ method: 'GET', url, headers: { 'accept-encoding': 'gzip, deflate, br' } });
  expect(br.statusCode, br.body).toBe(200);
  expect(br.headers['content-encoding']).toBe('br');
  expect(br.rawPayload.length).toBeLessThan(script.length / 5);
  const gz = await t.app.inject({ method: 'GET', url, headers: { 'accept-encoding': 'gzip' } });
  expect(gz.headers['content-encoding']).toBe('gzip');
  const plain = await t.app.inject({ method: 'GET', url });
  expect(plain.headers['content-encoding']).toBeUndefined();
  expect(plain.body).toBe(script);
});

it('keeps hashed assets a year and asks for the page again each time', async () => {
  const asset = await t.app.inject({ method: 'GET', url: '/assets/index-AbC123.js' });
  expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  const page = await t.app.inject({ method: 'GET', url: '/' });
  expect(page.statusCode).toBe(200);
  expect(page.headers['cache-control']).toBe('no-cache');
});
