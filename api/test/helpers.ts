import { randomUUID } from 'node:crypto';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { gompertz, type Account, type ErrorResponse, type SignUpRequest } from '@peakwise/shared';
import type { Response } from 'light-my-request';
import { afterAll, afterEach, beforeAll, beforeEach, expect, vi } from 'vitest';
import type { Database } from '../src/db/database.js';
import { createTestApp, resetDatabase, sessionCookie, type TestApp } from './test-app.js';

export type InjectResponse = Response;

/** Not on any common-password list, not the e-mail, no composition tricks: a plain passphrase. */
export const PASSWORD = 'levain bubbles past the rubber band';

let counter = 0;

/** An e-mail no other test has used in this run, so files need not empty the tables. */
export function uniqueEmail(tag = 'baker'): string {
  counter += 1;
  return `${tag}.${process.pid}.${Date.now().toString(36)}.${counter}@example.com`;
}

/** A lower-case passphrase of exactly `length` characters (code points), from ordinary words. */
export function passphrase(length: number): string {
  const words = 'country loaf rye spelt levain crumb crust proof bulk stretch fold autolyse ';
  return words.repeat(Math.ceil(length / words.length) + 1).slice(0, length);
}

export interface SignedUp {
  account: Account;
  /** `peakwise.sid=…`, ready for a Cookie header. */
  cookie: string;
  email: string;
  password: string;
  displayName: string;
}

export async function signUp(app: NestFastifyApplication, overrides: Partial<SignUpRequest> = {}): Promise<SignedUp> {
  const request: SignUpRequest = {
    email: uniqueEmail(),
    displayName: 'Theo Park',
    password: PASSWORD,
    ...overrides,
  };
  const res = await app.inject({ method: 'POST', url: '/api/auth/sign-up', payload: request });
  if (res.statusCode !== 201) throw new Error(`sign-up failed: ${res.statusCode} ${res.body}`);
  return {
    account: res.json<Account>(),
    cookie: sessionCookie(res.headers['set-cookie']),
    email: request.email.trim().toLowerCase(),
    password: request.password,
    displayName: request.displayName,
  };
}

export function signIn(
  app: NestFastifyApplication,
  email: string,
  password: string,
  cookie?: string,
): Promise<InjectResponse> {
  return app.inject({
    method: 'POST',
    url: '/api/auth/sign-in',
    payload: { email, password },
    headers: cookie ? { cookie } : {},
  });
}

/** Signs in and returns the new session cookie (fails the test unless sign-in answers 200). */
export async function signInCookie(app: NestFastifyApplication, email: string, password: string): Promise<string> {
  const res = await signIn(app, email, password);
  expect(res.statusCode, res.body).toBe(200);
  return sessionCookie(res.headers['set-cookie']);
}

export function getAccount(app: NestFastifyApplication, cookie?: string): Promise<InjectResponse> {
  return app.inject({ method: 'GET', url: '/api/account', headers: cookie ? { cookie } : {} });
}

/**
 * Asserts the one error shape (shared/src/contracts/errors.ts): exactly statusCode, error,
 * message and optionally details of {field, message}; returns the parsed body.
 */
export function expectError(res: InjectResponse, status: number): ErrorResponse {
  expect(res.statusCode, res.body).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/json/);
  const body = res.json<ErrorResponse>();
  const keys = Object.keys(body).sort();
  expect(keys.filter((k) => k !== 'details')).toEqual(['error', 'message', 'statusCode']);
  expect(body.statusCode).toBe(status);
  expect(typeof body.error).toBe('string');
  expect(body.error.length).toBeGreaterThan(0);
  expect(typeof body.message).toBe('string');
  expect(body.message.length).toBeGreaterThan(0);
  if (keys.includes('details')) {
    expect(Array.isArray(body.details)).toBe(true);
    for (const detail of body.details ?? []) {
      expect(Object.keys(detail).sort()).toEqual(['field', 'message']);
      expect(typeof detail.field).toBe('string');
      expect(typeof detail.message).toBe('string');
    }
  }
  return body;
}

/** The field names of an error's details, in order. */
export function detailFields(body: ErrorResponse): string[] {
  return (body.details ?? []).map((d) => d.field);
}

/** Asserts a 400 whose details name exactly these fields (in any order). */
export function expectFieldErrors(res: InjectResponse, fields: string[]): ErrorResponse {
  const body = expectError(res, 400);
  expect(detailFields(body).sort()).toEqual([...fields].sort());
  return body;
}

/** The store's session id inside a `peakwise.sid=<sid>.<signature>` cookie. */
export function sidOf(cookie: string): string {
  const value = decodeURIComponent(cookie.slice(cookie.indexOf('=') + 1));
  return value.slice(0, value.lastIndexOf('.'));
}

export async function sessionSids(db: Database): Promise<string[]> {
  const rows = await db.selectFrom('session').select('sid').execute();
  return rows.map((r) => r.sid);
}

export async function makeAdmin(db: Database, accountId: string): Promise<void> {
  await db.updateTable('account').set({ role: 'admin' }).where('id', '=', accountId).execute();
}

export interface ParsedSetCookie {
  name: string;
  value: string;
  /** Attribute names lower-cased; flag attributes map to ''. */
  attributes: Map<string, string>;
}

export function parseSetCookie(header: string): ParsedSetCookie {
  const [pair = '', ...parts] = header.split(';').map((p) => p.trim());
  const eq = pair.indexOf('=');
  const attributes = new Map<string, string>();
  for (const part of parts) {
    const i = part.indexOf('=');
    if (i === -1) attributes.set(part.toLowerCase(), '');
    else attributes.set(part.slice(0, i).toLowerCase(), part.slice(i + 1));
  }
  return { name: pair.slice(0, eq), value: pair.slice(eq + 1), attributes };
}

/** Words that would mean an error message leaks internals: stack frames, SQL, driver errors. */
export function expectNoInternals(res: InjectResponse): void {
  const body = res.body;
  expect(body).not.toMatch(/\bat [\w.<>]+ \(|\bat .*:\d+:\d+/); // stack frames
  expect(body).not.toMatch(/\b(SELECT|INSERT|UPDATE|DELETE)\b/);
  expect(body).not.toMatch(/relation|violates|constraint|column|syntax error|postgres|kysely/i);
  expect(body).not.toMatch(/node_modules|\.ts:\d+|\.js:\d+/);
}

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'DELETE';

/** A fresh Idempotency-Key header, as the web client sends with each write. */
export const freshKey = (): { 'idempotency-key': string } => ({ 'idempotency-key': randomUUID() });

/**
 * One request through the real app, signed in with `cookie` (or anonymous when null). Writes
 * carry a fresh Idempotency-Key like the web client's (several logbook writes require one);
 * tests of the key itself send their own headers.
 */
export function send(
  app: NestFastifyApplication,
  method: HttpMethod,
  url: string,
  cookie: string | null,
  payload?: unknown,
): Promise<InjectResponse> {
  const headers = { ...(cookie ? { cookie } : {}), ...(method === 'GET' ? {} : freshKey()) };
  return app.inject({ method, url, payload: payload as never, headers });
}

/** Fails the test unless `res` answers `status` (201 by default); returns its JSON body. */
export async function created<T>(res: InjectResponse | Promise<InjectResponse>, status = 201): Promise<T> {
  const r = await res;
  expect(r.statusCode, r.body).toBe(status);
  return r.json<T>();
}

/**
 * The hooks of a file about one signed-in baker: one app for the file, an empty database and a
 * fresh sign-up (Theo Park unless `as` says otherwise) before each test, mocks restored after.
 * `ready` hands the file its app and baker before each test, as neither exists before the hooks run.
 */
export function withSignedInBaker(as: Partial<SignUpRequest>, ready: (t: TestApp, baker: SignedUp) => void): void {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  afterEach(() => vi.restoreAllMocks());
  beforeEach(async () => {
    await resetDatabase(t.db);
    ready(t, await signUp(t.app, { displayName: 'Theo Park', ...as }));
  });
}

/**
 * The height (mm, to 0.1 mm) `hours` after feeding of a jar starting at `startMm` that rises along
 * the Gompertz shape of the published defaults, `rate` × as fast (invented test data).
 */
export function gompertzHeight(startMm: number, hours: number, rate = 1): number {
  return Math.round(startMm * (1 + gompertz(hours * rate, 1.5, 0.35, 1.5)) * 10) / 10;
}
