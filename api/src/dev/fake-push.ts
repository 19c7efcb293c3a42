import { createECDH, createPublicKey, randomBytes, randomUUID, verify, type ECDH } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:https';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { dirname } from 'node:path';
import { decrypt } from 'http_ece';
import { generate } from 'selfsigned';

/**
 * A stand-in for a browser vendor's push service, for development and tests only. It speaks the
 * parts of RFC 8030 (push), RFC 8291 (message encryption) and RFC 8292 (VAPID) a sender meets:
 *
 *   POST /subscriptions          make a device: answers a PushSubscriptionJSON (endpoint + keys)
 *   DELETE /subscriptions/:id    the device is gone: later pushes to it get 410, as real services do
 *   POST /push/:id               the endpoint: checks the VAPID JWT, decrypts the aes128gcm body
 *                                with the device's private key, keeps it
 *   GET /messages                what arrived, newest first (decrypted);  DELETE /messages empties
 *
 * It serves https with a self-signed certificate (web-push only speaks https); the sender trusts
 * it through the PEM answered as `certificate` (the API's PUSH_CA_FILE). Never delivers anything.
 */
export interface FakePushOptions {
  /** 0 picks a free port (tests). */
  port?: number;
  host?: string;
  /** Oldest messages are dropped beyond this count. */
  max?: number;
  /** Keeps devices (their keys) and messages across restarts in this JSON file; null: memory only. */
  file?: string | null;
}

export interface FakePushMessage {
  id: string;
  deviceId: string;
  receivedAt: string;
  ttl: number | null;
  urgency: string | null;
  topic: string | null;
  /** The VAPID public key the sender signed with (base64url). */
  vapidKey: string;
  /** The decrypted payload, parsed as JSON when it is JSON. */
  payload: unknown;
}

export interface FakePushDevice {
  endpoint: string;
  expirationTime: null;
  keys: { p256dh: string; auth: string };
}

export interface FakePush {
  url: string;
  /** PEM of the self-signed certificate to trust. */
  certificate: string;
  newDevice(): FakePushDevice;
  removeDevice(endpoint: string): void;
  /** Newest first. */
  messages(): FakePushMessage[];
  clear(): void;
  close(): Promise<void>;
}

interface Device {
  ecdh: ECDH;
  auth: Buffer;
}

const MAX_BODY_BYTES = 4096; // RFC 8030 §7.2: services must accept at least 4096 bytes.

export async function startFakePush(options: FakePushOptions = {}): Promise<FakePush> {
  const host = options.host ?? '127.0.0.1';
  const max = options.max ?? 200;
  const file = options.file ?? null;
  const saved = file ? load(file) : { devices: [], messages: [] };
  const devices = new Map<string, Device>(saved.devices.map((d) => [d.id, revive(d)]));
  let stored: FakePushMessage[] = saved.messages;
  const persist = (): void => {
    if (file) save(file, { devices: [...devices].map(([id, d]) => freeze(id, d)), messages: stored });
  };
  const pems = await generate([{ name: 'commonName', value: host }], {
    keyType: 'ec',
    algorithm: 'sha256',
    extensions: [
      { name: 'basicConstraints', cA: false },
      {
        name: 'subjectAltName',
        altNames: [
          { type: 2, value: 'localhost' },
          { type: 7, ip: '127.0.0.1' },
        ],
      },
    ],
  });

  let origin = '';
  const newDevice = (): FakePushDevice => {
    const id = randomUUID();
    const ecdh = createECDH('prime256v1');
    ecdh.generateKeys();
    const auth = randomBytes(16);
    devices.set(id, { ecdh, auth });
    persist();
    return {
      endpoint: `${origin}/push/${id}`,
      expirationTime: null,
      keys: { p256dh: ecdh.getPublicKey().toString('base64url'), auth: auth.toString('base64url') },
    };
  };

  const server = createServer({ key: pems.private, cert: pems.cert }, (req, res) => {
    handle(req, res).catch((error: Error) => json(res, 500, { message: error.message }));
  });

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const path = (req.url ?? '/').split('?')[0] ?? '/';
    if (path === '/subscriptions' && req.method === 'POST') return json(res, 201, newDevice());
    const sub = /^\/subscriptions\/([0-9a-f-]{36})$/.exec(path);
    if (sub && req.method === 'DELETE') {
      devices.delete(sub[1]!);
      persist();
      return void res.writeHead(204).end();
    }
    if (path === '/messages' && req.method === 'GET') return json(res, 200, { items: stored });
    if (path === '/messages' && req.method === 'DELETE') {
      stored = [];
      persist();
      return void res.writeHead(204).end();
    }
    const push = /^\/push\/([0-9a-f-]{36})$/.exec(path);
    if (push && req.method === 'POST') return receive(push[1]!, req, res);
    json(res, 404, { message: 'Not a fake push service route' });
  }

  async function receive(deviceId: string, req: IncomingMessage, res: ServerResponse): Promise<void> {
    const body = await readBody(req);
    if (body === null) return json(res, 413, { message: `Payload over ${MAX_BODY_BYTES} bytes` });
    const device = devices.get(deviceId);
    // RFC 8030 §7.3: an expired or unsubscribed endpoint answers 404 or 410; senders drop it.
    if (!device) return json(res, 410, { message: 'This subscription is gone' });
    const vapid = checkVapid(req.headers.authorization, origin);
    if ('error' in vapid) return json(res, 403, { message: vapid.error });
    if (req.headers['content-encoding'] !== 'aes128gcm')
      return json(res, 415, { message: 'Content-Encoding must be aes128gcm' });
    const ttl = req.headers.ttl === undefined ? null : Number(req.headers.ttl);
    if (ttl === null || !Number.isInteger(ttl) || ttl < 0)
      return json(res, 400, { message: 'A TTL header is required' });
    let plain: Buffer;
    try {
      plain = decrypt(body, {
        version: 'aes128gcm',
        privateKey: device.ecdh,
        authSecret: device.auth.toString('base64url'),
      });
    } catch (error) {
      return json(res, 400, { message: `Could not decrypt: ${(error as Error).message}` });
    }
    const text = plain.toString('utf8');
    let payload: unknown = text;
    try {
      payload = JSON.parse(text);
    } catch {
      // Not JSON: keep the text as it came.
    }
    const message: FakePushMessage = {
      id: randomUUID(),
      deviceId,
      receivedAt: new Date().toISOString(),
      ttl,
      urgency: header(req, 'urgency'),
      topic: header(req, 'topic'),
      vapidKey: vapid.key,
      payload,
    };
    stored = [message, ...stored].slice(0, max);
    persist();
    res.writeHead(201, { location: `${origin}/messages/${message.id}` }).end();
  }

  const port = await new Promise<number>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 2527, host, () => {
      server.off('error', reject);
      resolve((server.address() as AddressInfo).port);
    });
  });
  origin = `https://${host}:${port}`;

  return {
    url: origin,
    certificate: pems.cert,
    newDevice,
    removeDevice: (endpoint) => {
      devices.delete(endpoint.split('/').pop() ?? '');
      persist();
    },
    messages: () => [...stored],
    clear: () => {
      stored = [];
      persist();
    },
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

/**
 * RFC 8292: `Authorization: vapid t=<JWT>, k=<public key>`; the JWT is ES256-signed by that key,
 * its `aud` is the push service's origin and `exp` at most 24 hours ahead.
 */
function checkVapid(authorization: string | undefined, origin: string): { key: string } | { error: string } {
  const match = /^vapid t=([\w-]+\.[\w-]+\.[\w-]+),\s*k=([\w-]+)$/.exec(authorization ?? '');
  if (!match) return { error: 'Authorization must be "vapid t=…, k=…"' };
  const [, token, key] = match as unknown as [string, string, string];
  const [head, claims, signature] = token.split('.') as [string, string, string];
  const raw = Buffer.from(key, 'base64url');
  if (raw.length !== 65) return { error: 'k is not an uncompressed P-256 public key' };
  const publicKey = createPublicKey({
    key: {
      kty: 'EC',
      crv: 'P-256',
      x: raw.subarray(1, 33).toString('base64url'),
      y: raw.subarray(33).toString('base64url'),
    },
    format: 'jwk',
  });
  const signed = verify(
    'sha256',
    Buffer.from(`${head}.${claims}`),
    { key: publicKey, dsaEncoding: 'ieee-p1363' },
    Buffer.from(signature, 'base64url'),
  );
  if (!signed) return { error: 'The VAPID signature does not verify' };
  const body = JSON.parse(Buffer.from(claims, 'base64url').toString('utf8')) as { aud?: string; exp?: number };
  if (body.aud !== origin) return { error: `aud must be ${origin}` };
  const now = Date.now() / 1000;
  if (typeof body.exp !== 'number' || body.exp < now || body.exp > now + 24 * 3600)
    return { error: 'exp must lie within the next 24 hours' };
  return { key };
}

function header(req: IncomingMessage, name: string): string | null {
  const value = req.headers[name];
  return typeof value === 'string' ? value : null;
}

function readBody(req: IncomingMessage): Promise<Buffer | null> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size <= MAX_BODY_BYTES) chunks.push(chunk);
    });
    req.on('end', () => resolve(size > MAX_BODY_BYTES ? null : Buffer.concat(chunks)));
    req.on('error', reject);
  });
}

function json(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  res.end(JSON.stringify(body));
}

interface SavedDevice {
  id: string;
  /** The P-256 private key and the auth secret, base64url. */
  privateKey: string;
  auth: string;
}

interface Saved {
  devices: SavedDevice[];
  messages: FakePushMessage[];
}

function freeze(id: string, device: Device): SavedDevice {
  return { id, privateKey: device.ecdh.getPrivateKey('base64url'), auth: device.auth.toString('base64url') };
}

function revive(saved: SavedDevice): Device {
  const ecdh = createECDH('prime256v1');
  ecdh.setPrivateKey(Buffer.from(saved.privateKey, 'base64url'));
  return { ecdh, auth: Buffer.from(saved.auth, 'base64url') };
}

function load(file: string): Saved {
  if (!existsSync(file)) return { devices: [], messages: [] };
  try {
    const parsed = JSON.parse(readFileSync(file, 'utf8')) as Partial<Saved>;
    return { devices: parsed.devices ?? [], messages: parsed.messages ?? [] };
  } catch {
    // A half-written or hand-edited file is not worth refusing to start over: begin empty.
    return { devices: [], messages: [] };
  }
}

/** Write then rename, so a crash mid-write leaves the previous file. */
function save(file: string, saved: Saved): void {
  mkdirSync(dirname(file), { recursive: true });
  const temporary = `${file}.${process.pid}.tmp`;
  writeFileSync(temporary, JSON.stringify(saved, null, 1) + '\n', { mode: 0o600 });
  renameSync(temporary, file);
}
