import { randomUUID } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { dirname } from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DevMailMessage } from '@peakwise/shared';

/**
 * A stand-in for a hosted mail service, for development and tests only: accepts every message on
 * loopback SMTP, keeps the newest `max`, and lists them as JSON over loopback HTTP
 * (GET /messages newest first, DELETE /messages empties the box). Never delivers anything.
 */
export interface FakeSmtpOptions {
  /** 0 picks a free port (tests). */
  smtpPort?: number;
  httpPort?: number;
  host?: string;
  /** Keeps messages across restarts in this JSON file; null keeps them in memory only. */
  file?: string | null;
  /** Oldest messages are dropped beyond this count. */
  max?: number;
}

export interface StoredMail extends DevMailMessage {
  id: string;
}

export interface FakeSmtp {
  smtpUrl: string;
  httpUrl: string;
  /** Newest first. */
  messages(): StoredMail[];
  clear(): void;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = options.host ?? '127.0.0.1';
  const max = options.max ?? 200;
  const file = options.file ?? null;
  let stored: StoredMail[] = file ? load(file) : [];

  const keep = (message: StoredMail): void => {
    stored = [message, ...stored].slice(0, max);
    if (file) save(file, stored);
  };

  const smtp = new SMTPServer({
    authOptional: true,
    // Loopback only; a self-signed STARTTLS would only make clients fail certificate checks.
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: 'Peakwise fake mail server (development only, delivers nothing)',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          keep({
            id: randomUUID(),
            to: session.envelope.rcptTo.map((r) => r.address),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            subject: parsed.subject ?? '',
            date: new Date().toISOString(),
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            messageId: parsed.messageId ?? null,
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  const http = createServer((req, res) => handle(req, res));
  function handle(req: IncomingMessage, res: ServerResponse): void {
    const path = (req.url ?? '/').split('?')[0];
    if (path === '/messages' && req.method === 'GET') return json(res, 200, { items: stored });
    if (path === '/messages' && req.method === 'DELETE') {
      stored = [];
      if (file) save(file, stored);
      res.writeHead(204).end();
      return;
    }
    json(res, 404, { message: 'GET or DELETE /messages' });
  }

  const smtpPort = await listen((port, cb) => smtp.listen(port, host, cb), smtp, options.smtpPort ?? 2525);
  let httpPort: number;
  try {
    httpPort = await listen((port, cb) => http.listen(port, host, cb), http, options.httpPort ?? 2526);
  } catch (error) {
    await new Promise<void>((resolve) => smtp.close(resolve));
    throw error;
  }
  const urlHost = host.includes(':') ? `[${host}]` : host;
  return {
    smtpUrl: `smtp://${urlHost}:${smtpPort}`,
    httpUrl: `http://${urlHost}:${httpPort}`,
    messages: () => [...stored],
    clear: () => {
      stored = [];
      if (file) save(file, stored);
    },
    close: async () => {
      http.closeAllConnections();
      await Promise.all([
        new Promise<void>((resolve) => http.close(() => resolve())),
        new Promise<void>((resolve) => smtp.close(resolve)),
      ]);
    },
  };
}

interface Listener {
  once(event: 'error', fn: (error: Error) => void): unknown;
  off(event: 'error', fn: (error: Error) => void): unknown;
}

/** Listens and resolves with the bound port (which differs from `port` when it is 0). */
function listen(start: (port: number, cb: () => void) => unknown, emitter: Listener, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    emitter.once('error', reject);
    const server = start(port, () => {
      emitter.off('error', reject);
      resolve(((server as Server).address() as AddressInfo).port);
    });
  });
}

function json(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  res.end(JSON.stringify(body));
}

function load(file: string): StoredMail[] {
  if (!existsSync(file)) return [];
  try {
    const parsed: unknown = JSON.parse(readFileSync(file, 'utf8'));
    return Array.isArray(parsed) ? (parsed as StoredMail[]) : [];
  } catch {
    // A half-written or hand-edited file is not worth refusing to start over: begin empty.
    return [];
  }
}

/** Write then rename, so a crash mid-write leaves the previous file rather than half a JSON array. */
function save(file: string, messages: StoredMail[]): void {
  mkdirSync(dirname(file), { recursive: true });
  const temporary = `${file}.${process.pid}.tmp`;
  writeFileSync(temporary, JSON.stringify(messages, null, 1) + '\n');
  renameSync(temporary, file);
}
