import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import fastifyCookie from '@fastify/cookie';
import fastifySession from '@fastify/session';
import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, type NestFastifyApplication } from '@nestjs/platform-fastify';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import { REQUEST_BODY_MAX_BYTES } from '@peakwise/shared';
import connectPgSimple from 'connect-pg-simple';
import expressSession from 'express-session';
import type { Logger } from 'pino';
import { AppModule } from './app.module.js';
import { registerCsrfCheck } from './common/csrf.js';
import { ErrorFilter, frameworkError } from './common/error.filter.js';
import { registerSecurityHeaders } from './common/security-headers.js';
import { createValidationPipe } from './common/validation.js';
import type { AppConfig } from './config.js';
import { openDatabase, type DatabaseHandle } from './db/database.js';
import { NestPinoLogger, createLogger } from './logger.js';

const FOURTEEN_DAYS_MS = 14 * 24 * 60 * 60 * 1000;

export interface CreatedApp {
  app: NestFastifyApplication;
  logger: Logger;
}

/**
 * `trustProxy` (TRUST_PROXY): behind a reverse proxy, which hops to believe for the client's
 * address and scheme (X-Forwarded-For/-Proto). The sign-in brakes count per address and HSTS
 * follows the scheme; without it every client would share the proxy's address.
 */
export function createAdapter(logger: Logger, trustProxy: AppConfig['trustProxy'] = false): FastifyAdapter {
  return new FastifyAdapter({
    loggerInstance: logger,
    // Fastify takes a hop count too; the adapter's option type leaves numbers out.
    trustProxy: trustProxy as boolean | string,
    // Honour a caller's request id (a proxy, a test) or make one, so log lines can be followed.
    requestIdHeader: 'x-request-id',
    genReqId: () => randomUUID(),
    bodyLimit: REQUEST_BODY_MAX_BYTES,
    frameworkErrors: frameworkError,
  });
}

/** The OpenAPI document; also committed as api/openapi.json, which a test keeps current. */
export function buildOpenApiDocument(app: NestFastifyApplication): OpenAPIObject {
  return SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Peakwise API')
      .setDescription(
        'Sourdough culture logbook. Errors: { statusCode, error, message, details?: [{ field, message }] }.',
      )
      .setVersion('0.1.0')
      .addCookieAuth('peakwise.sid')
      .build(),
  );
}

export const APP_OPTIONS = {
  // Fastify's own JSON parser is all we accept; without Nest's extra parsers any other content
  // type is answered with 415.
  bodyParser: false,
} as const;

/** Builds the whole HTTP application without listening: main.ts listens, tests use inject(). */
export async function createApp(
  config: AppConfig,
  logger: Logger = createLogger(config.logLevel),
): Promise<CreatedApp> {
  const database = openDatabase(config.databaseUrl);
  const app = await NestFactory.create<NestFastifyApplication>(
    AppModule.forRoot(config, database),
    createAdapter(logger, config.trustProxy),
    {
      ...APP_OPTIONS,
      logger: new NestPinoLogger(logger),
    },
  );
  await configureApp(app, config, database, logger);
  return { app, logger };
}

/** Everything around the Nest module: plugins, sessions, pipes, filters, docs, static files. */
export async function configureApp(
  app: NestFastifyApplication,
  config: AppConfig,
  database: DatabaseHandle,
  logger: Logger,
): Promise<void> {
  const fastify = app.getHttpAdapter().getInstance();
  fastify.removeContentTypeParser('text/plain');
  fastify.addHook('onSend', async (request, reply) => {
    reply.header('x-request-id', request.id);
  });

  await registerSecurityHeaders(app, fastify, config.mail.publicUrl);
  const corsOrigins = config.corsOrigins ?? [];
  // Closed unless CORS_ORIGINS lists origins: then only those, with cookies, and no wildcard.
  if (corsOrigins.length > 0) {
    app.enableCors({
      origin: corsOrigins,
      credentials: true,
      methods: ['GET', 'POST', 'PATCH', 'PUT', 'DELETE'],
      allowedHeaders: ['Content-Type', 'Idempotency-Key'],
      maxAge: 600,
    });
  }
  // After helmet, so its headers are on the refusals too; before the session is loaded.
  registerCsrfCheck(fastify, { publicOrigin: new URL(config.mail.publicUrl).origin, trustedOrigins: corsOrigins });
  await app.register(fastifyCookie as never);
  const PgStore = connectPgSimple(expressSession);
  const store = new PgStore({
    pool: database.pool,
    tableName: 'session',
    createTableIfMissing: false,
    pruneSessionInterval: config.sessionPruneSeconds > 0 ? config.sessionPruneSeconds : false,
  });
  await app.register(fastifySession as never, {
    secret: config.sessionSecret,
    cookieName: 'peakwise.sid',
    store,
    saveUninitialized: false,
    // Every response pushes the expiry out again: 14 days idle, not 14 days after sign-in.
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', path: '/', maxAge: FOURTEEN_DAYS_MS },
  });

  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ErrorFilter(logger, config.webDist));

  const document = buildOpenApiDocument(app);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });

  if (config.webDist) {
    app.useStaticAssets({
      root: config.webDist,
      prefix: '/',
      // web/scripts/compress-dist.mjs leaves .br and .gz copies beside the build's text files.
      preCompressed: true,
      // Our own Cache-Control below, not the plugin's max-age=0.
      cacheControl: false,
      setHeaders: (res, path) => {
        // Vite names every file under assets/ by its content: it can be kept for a year. The
        // page itself (and the service worker) must be asked for again each time.
        const value = /[\\/]assets[\\/]/.test(path) ? 'public, max-age=31536000, immutable' : 'no-cache';
        // Nest's types name Node's response; @fastify/static 10 hands over the Fastify reply.
        const target = res as unknown as { header?: (n: string, v: string) => unknown };
        if (typeof target.header === 'function') target.header('cache-control', value);
        else res.setHeader('cache-control', value);
      },
    });
  }

  fastify.addHook('onClose', async () => {
    store.close();
    await database.db.destroy();
  });
  await app.init();
}
