import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import type { Account } from '@peakwise/shared';
import { expect } from 'vitest';
import { repoRoot } from '../src/repo-root.js';
import { PASSWORD, uniqueEmail } from './helpers.js';
import { sessionCookie } from './test-app.js';

// Real API processes for api/test/alert-processes.api.test.ts: `node api/dist/src/main.js` as
// `npm start` runs it. PEAKWISE_API_ENTRY may name another build of main.js (another outDir).

export const API_ENTRY = process.env.PEAKWISE_API_ENTRY ?? join(repoRoot(), 'api', 'dist', 'src', 'main.js');

export interface ApiProcess {
  url: string;
  child: ChildProcess;
}

export interface ApiProcessOptions {
  databaseUrl: string;
  smtpUrl: string;
  mailFrom: string;
}

export interface Baker {
  accountId: string;
  email: string;
  cookie: string;
  cultureId: string;
}

/** A baker signed up through `api`, e-mail on for feeding reminders, with one culture. */
export async function bakerWithCulture(api: ApiProcess): Promise<Baker> {
  const email = uniqueEmail('processes');
  const signUp = await fetch(`${api.url}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, displayName: 'Theo Park', password: PASSWORD, timeZone: 'UTC' }),
  });
  expect(signUp.status, await signUp.clone().text()).toBe(201);
  const account = (await signUp.json()) as Account;
  const cookie = sessionCookie(signUp.headers.getSetCookie());
  const prefs = { channels: { 'feeding-due': { email: true } } };
  await callApi(api, cookie, 'PATCH', '/api/account/alert-preferences', prefs, 200);
  const culture = await callApi<{ id: string }>(api, cookie, 'POST', '/api/cultures', { name: 'Bramble' }, 201);
  return { accountId: account.id, email, cookie, cultureId: culture.id };
}

/** A JSON request as the baker with `cookie`; fails the test unless it answers `status`. */
export async function callApi<T = unknown>(
  api: ApiProcess,
  cookie: string,
  method: string,
  path: string,
  body: unknown,
  status: number,
): Promise<T> {
  const res = await fetch(`${api.url}${path}`, {
    method,
    // Writes carry a fresh Idempotency-Key, as the web client's do (some routes require one).
    headers: {
      'content-type': 'application/json',
      cookie,
      ...(method === 'GET' ? {} : { 'idempotency-key': crypto.randomUUID() }),
    },
    body: JSON.stringify(body),
  });
  const text = await res.text();
  expect(res.status, text).toBe(status);
  return JSON.parse(text) as T;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

/** `node api/dist/src/main.js` as `npm start` runs it, on a free loopback port, up once /api/health answers. */
export async function startApi(options: ApiProcessOptions): Promise<ApiProcess> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn('node', [API_ENTRY], {
    cwd: repoRoot(),
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      DATABASE_URL: options.databaseUrl,
      HOST: '127.0.0.1',
      PORT: String(port),
      // Links in its e-mails name the process that sent them.
      PUBLIC_URL: url,
      SESSION_SECRET: 'test-only-secret-test-only-secret-0123456789',
      NODE_ENV: 'test',
      LOG_LEVEL: 'warn',
      // npm test's cluster runs without fsync (durability.ts refuses that otherwise).
      ALLOW_UNSAFE_DURABILITY: '1',
      WEB_DIST: '',
      DEV_MAIL_URL: '',
      SMTP_URL: options.smtpUrl,
      MAIL_FROM: options.mailFrom,
      PASSWORD_HASH_COST: '14',
      SESSION_PRUNE_SECONDS: '0',
      ALERT_POLLING_SECONDS: '0.5',
    },
  });
  let output = '';
  const keep = (chunk: Buffer) => {
    output = (output + chunk.toString()).slice(-8000);
  };
  child.stdout.on('data', keep);
  child.stderr.on('data', keep);
  const until = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the API exited early (${child.exitCode}):\n${output}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > until) {
      child.kill('SIGTERM');
      throw new Error(`the API did not become healthy within 30 s:\n${output}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return { url, child };
}

export async function stopApi(api: ApiProcess): Promise<void> {
  if (api.child.exitCode !== null) return;
  const exited = new Promise<void>((resolve) => api.child.once('exit', () => resolve()));
  api.child.kill('SIGTERM');
  const timer = setTimeout(() => api.child.kill('SIGKILL'), 15_000);
  await exited;
  clearTimeout(timer);
}
