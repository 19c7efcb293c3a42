import { randomBytes } from 'node:crypto';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { FastifyInstance } from 'fastify';
import { Test } from '@nestjs/testing';
import { sql } from 'kysely';
import { pino } from 'pino';
import { APP_OPTIONS, configureApp, createAdapter } from '../src/app.factory.js';
import { AppModule } from '../src/app.module.js';
import type { AppConfig } from '../src/config.js';
import { openDatabase, type Database } from '../src/db/database.js';

export interface TestApp {
  app: NestFastifyApplication;
  db: Database;
  config: AppConfig;
  close(): Promise<void>;
}

export function testConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is not set: run through `npm test`');
  return {
    databaseUrl,
    host: '127.0.0.1',
    port: 0,
    sessionSecret: randomBytes(32).toString('hex'),
    webDist: null,
    logLevel: 'silent',
    // The lowest cost the config accepts; real runs use 17. The format stores its cost, so the
    // code path is the same.
    passwordHashCost: 14,
    sessionPruneSeconds: 0,
    // The test cluster runs without fsync for speed; durability.api.test.ts checks the refusal.
    allowUnsafeDurability: true,
    // Suites sign in hundreds of times from one address; throttle.api.test.ts tests the brake.
    authAttemptsPerMinute: 100_000,
    // Nothing listens on port 9: a test that reads mail starts its own fake (test/mail-fixture.ts).
    mail: {
      smtpUrl: 'smtp://127.0.0.1:9',
      from: 'Peakwise <no-reply@peakwise.invalid>',
      publicUrl: 'http://127.0.0.1:3000',
      devMailUrl: 'http://127.0.0.1:9',
    },
    ...overrides,
  };
}

export interface TestAppOptions {
  /** Runs on the bare Fastify instance before any plugin is registered (e.g. to add an early hook). */
  beforeConfigure?: (fastify: FastifyInstance) => void;
}

/** The real application module on the real test database, built through @nestjs/testing. */
export async function createTestApp(
  overrides: Partial<AppConfig> = {},
  options: TestAppOptions = {},
): Promise<TestApp> {
  const config = testConfig(overrides);
  const database = openDatabase(config.databaseUrl, 4);
  const logger = pino({ level: config.logLevel });
  const moduleRef = await Test.createTestingModule({ imports: [AppModule.forRoot(config, database)] }).compile();
  const app = moduleRef.createNestApplication<NestFastifyApplication>(createAdapter(logger, config.trustProxy), {
    ...APP_OPTIONS,
    logger: false,
  });
  options.beforeConfigure?.(app.getHttpAdapter().getInstance());
  await configureApp(app, config, database, logger);
  await app.getHttpAdapter().getInstance().ready();
  return { app, db: database.db, config, close: () => app.close() };
}

/**
 * Empties every table the app writes, between tests. Work the app does after answering (alert
 * refreshes, the queue's worker, mail sent after a 202) may still hold row locks, so TRUNCATE can
 * be picked as a deadlock victim (40P01); PostgreSQL has then rolled it back, and it is retried.
 */
export async function resetDatabase(db: Database): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await sql`TRUNCATE account, session, culture, feeding, rise_check, temperature_reading, idempotency_key,
        formula, formula_ingredient, formula_blend_flour, bake_plan, bake_plan_step, dough_reading,
        alert, alert_delivery, alert_preference, account_token, push_subscription, baking_class, class_member,
        class_invite, comment, photo, photo_object_trash, kitchen_reading, auth_throttle, sign_in_address`.execute(db);
      return;
    } catch (error) {
      if ((error as { code?: string }).code !== '40P01' || attempt >= 5) throw error;
      await new Promise((resolve) => setTimeout(resolve, 50 * attempt));
    }
  }
}

/** Every Set-Cookie header of a response that sets (not clears) the session cookie. */
export function liveSessionCookies(setCookie: string | string[] | undefined): string[] {
  const headers = setCookie === undefined ? [] : Array.isArray(setCookie) ? setCookie : [setCookie];
  // A sign-in over an old session answers with two headers: one clearing the old cookie
  // (`peakwise.sid=; Max-Age=0`) and one setting the new; the browser keeps the last.
  return headers.filter((c) => c.startsWith('peakwise.sid=') && !c.startsWith('peakwise.sid=;'));
}

/** The `name=value` part of the session's Set-Cookie header, ready to send back as a Cookie header. */
export function sessionCookie(setCookie: string | string[] | undefined): string {
  const header = liveSessionCookies(setCookie).at(-1);
  if (!header) throw new Error(`no session cookie in ${JSON.stringify(setCookie)}`);
  return header.split(';')[0]!;
}
