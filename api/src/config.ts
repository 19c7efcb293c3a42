import { readFileSync } from 'node:fs';

/** Everything the API reads from its environment, checked once at start-up. */
export interface AppConfig {
  databaseUrl: string;
  host: string;
  port: number;
  sessionSecret: string;
  /** Folder of the built web app to serve beside /api, or null to serve the API alone. */
  webDist: string | null;
  logLevel: string;
  /** log2 of scrypt's N. 17 by default (OWASP's minimum for scrypt); tests lower it for speed. */
  passwordHashCost: number;
  /**
   * Sign-in, sign-up and password-reset attempts allowed per client address per minute, per route
   * (brute-force brake; counted in PostgreSQL so every process shares it).
   */
  authAttemptsPerMinute: number;
  /** Failed sign-ins per e-mail, from addresses it never signed in from, per window (10 when left out). */
  signInFailuresPerAccount?: number;
  /** The window of that count, minutes (15 when left out). */
  signInFailureWindowMinutes?: number;
  /**
   * Other origins allowed to call the API from a browser (CORS_ORIGINS, comma-separated, e.g.
   * `https://app.example.com`); empty or left out: none, no CORS headers at all.
   */
  corsOrigins?: string[];
  /**
   * TRUST_PROXY: which proxies to believe for the client's address and scheme (Fastify's
   * trustProxy): a hop count, `true`, or addresses/CIDRs separated by commas. Off when left out.
   */
  trustProxy?: boolean | number | string;
  /**
   * ALLOW_UNSAFE_DURABILITY=1: start even if PostgreSQL runs with fsync or synchronous_commit off.
   * Only for a throw-away test cluster (npm test's); otherwise the API refuses, since a crash could
   * lose writes it already confirmed to a baker (api/src/db/durability.ts).
   */
  allowUnsafeDurability?: boolean;
  /** Delete expired sessions every this many seconds; 0 turns pruning off (tests). */
  sessionPruneSeconds: number;
  /** Outgoing mail (api/src/mail/). */
  mail: MailConfig;
  /** How often the alert worker polls its queue, seconds (pg-boss, at least 0.5); 2 when left out. */
  alertPollingSeconds?: number;
  /** Web push (api/src/push/); left out, the defaults below apply (tests). */
  push?: PushConfig;
  /** Photo storage (api/src/photo/): an S3-compatible bucket; left out, uploads answer 503 (tests that need it pass one). */
  storage?: StorageConfig;
}

export interface StorageConfig {
  /** S3-compatible endpoint (S3_ENDPOINT); null: the AWS endpoint of `region`. `npm start` runs a fake one. */
  endpoint: string | null;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** Remove objects no photo row names (left by a failed delete or upload) at start and hourly. */
  sweep: boolean;
}

export interface PushConfig {
  /** VAPID contact (RFC 8292 §2.1): a mailto: or https: URL push services can reach us at. */
  subject: string;
  /** PEM of one more certificate to trust for push endpoints: the fake push service's (PUSH_CA_FILE). */
  extraCa: string | null;
  /** Accept endpoints on loopback or private addresses: development and tests only, never production. */
  allowPrivateEndpoints: boolean;
  /** The fake push service, listed at /api/dev/push (DEV_PUSH_URL); null (always in production) hides that route. */
  devServiceUrl?: string | null;
}

export const DEFAULT_PUSH_CONFIG: PushConfig = {
  subject: 'mailto:no-reply@peakwise.invalid',
  extraCa: null,
  allowPrivateEndpoints: true,
};

export interface MailConfig {
  /** SMTP server for outgoing mail; `npm start` runs a fake one (api/src/dev/fake-smtp.main.ts). */
  smtpUrl: string;
  from: string;
  /** Where the app is reached from outside, for links in e-mails; no trailing slash. */
  publicUrl: string;
  /** The fake SMTP server's HTTP side, listed at /api/dev/mail; null (always in production) hides that route. */
  devMailUrl: string | null;
}

function required(env: NodeJS.ProcessEnv, name: string): string {
  const value = env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const sessionSecret = required(env, 'SESSION_SECRET');
  // @fastify/session signs cookies with it and insists on at least 32 characters.
  if (sessionSecret.length < 32) throw new Error('SESSION_SECRET must be at least 32 characters');
  const passwordHashCost = Number(env.PASSWORD_HASH_COST ?? 17);
  if (!Number.isInteger(passwordHashCost) || passwordHashCost < 14 || passwordHashCost > 20) {
    throw new Error('PASSWORD_HASH_COST must be an integer from 14 to 20');
  }
  return {
    databaseUrl: required(env, 'DATABASE_URL'),
    host: env.HOST ?? '127.0.0.1',
    port: Number(env.PORT ?? 3000),
    sessionSecret,
    webDist: env.WEB_DIST || null,
    logLevel: env.LOG_LEVEL ?? 'info',
    passwordHashCost,
    sessionPruneSeconds: Number(env.SESSION_PRUNE_SECONDS ?? 900),
    alertPollingSeconds: Number(env.ALERT_POLLING_SECONDS ?? 2),
    authAttemptsPerMinute: Number(env.AUTH_ATTEMPTS_PER_MINUTE ?? 10),
    signInFailuresPerAccount: Number(env.SIGN_IN_FAILURES_PER_ACCOUNT ?? 10),
    signInFailureWindowMinutes: Number(env.SIGN_IN_FAILURE_WINDOW_MINUTES ?? 15),
    corsOrigins: parseOrigins(env.CORS_ORIGINS),
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    allowUnsafeDurability: env.ALLOW_UNSAFE_DURABILITY === '1',
    mail: {
      smtpUrl: env.SMTP_URL || 'smtp://127.0.0.1:2525',
      from: env.MAIL_FROM || 'Peakwise <no-reply@peakwise.invalid>',
      publicUrl: (env.PUBLIC_URL || `http://${publicHost(env.HOST)}:${env.PORT ?? 3000}`).replace(/\/+$/, ''),
      devMailUrl: env.NODE_ENV === 'production' ? null : env.DEV_MAIL_URL || null,
    },
    push: {
      subject: env.PUSH_SUBJECT || 'mailto:no-reply@peakwise.invalid',
      extraCa: env.PUSH_CA_FILE ? readFileSync(env.PUSH_CA_FILE, 'utf8') : null,
      allowPrivateEndpoints: env.NODE_ENV !== 'production',
      devServiceUrl: env.NODE_ENV === 'production' ? null : env.DEV_PUSH_URL || null,
    },
    ...(env.S3_BUCKET
      ? {
          storage: {
            endpoint: env.S3_ENDPOINT || null,
            bucket: env.S3_BUCKET,
            region: env.S3_REGION || 'us-east-1',
            accessKeyId: required(env, 'S3_ACCESS_KEY_ID'),
            secretAccessKey: required(env, 'S3_SECRET_ACCESS_KEY'),
            sweep: env.S3_SWEEP !== 'off',
          },
        }
      : {}),
  };
}

/** `https://a.example, https://b.example` → exact origins; anything that is not one is refused at start. */
function parseOrigins(value: string | undefined): string[] {
  const items = (value ?? '')
    .split(',')
    .map((item) => item.trim())
    .filter(Boolean);
  for (const item of items) {
    let origin: string | null;
    try {
      origin = new URL(item).origin;
    } catch {
      origin = null;
    }
    if (origin !== item.replace(/\/+$/, ''))
      throw new Error(`CORS_ORIGINS: ${item} is not an origin like https://app.example.com`);
  }
  return items.map((item) => item.replace(/\/+$/, ''));
}

function parseTrustProxy(value: string | undefined): boolean | number | string {
  const text = (value ?? '').trim();
  if (text === '' || text === 'false') return false;
  if (text === 'true') return true;
  return /^\d+$/.test(text) ? Number(text) : text;
}

/** A wildcard listen address is no address to put in a link. */
function publicHost(host: string | undefined): string {
  return !host || host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host;
}

export const APP_CONFIG = Symbol('APP_CONFIG');
