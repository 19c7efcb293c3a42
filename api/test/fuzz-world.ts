import { randomBytes, randomUUID } from 'node:crypto';
import { IDEMPOTENCY_KEY_HEADER, type ErrorResponse } from '@peakwise/shared';
import { sql } from 'kysely';
import { buildWorld, freshObjects, relationOf, type World } from './access-matrix.fixtures.js';
import { ROLES, type ObjectSet, type RoleName } from './access-matrix.model.js';
import { SIGNED_IN } from './access-matrix.model.js';
import { MATRIX, type MatrixRoute } from './access-matrix.table.js';
import type { FuzzRequest, RouteShape } from './fuzz-bodies.js';
import { signInCookie, uniqueEmail, type InjectResponse } from './helpers.js';
import { openDatabase } from '../src/db/database.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, testConfig, type TestApp } from './test-app.js';

// The world of the write-route fuzz: the access matrix's people and objects (a baker who owns a
// culture, feeding, rise check, plan, photo…, instructors with classes, an admin), and for each
// write route the caller who gets past its access check, so requests reach validation.

export const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'] as const;

/**
 * Write routes with neither a body nor a path id: there is nothing to send them that could be
 * invalid, so any request is a valid one. The test asserts this list is exactly what the app has.
 */
/**
 * Write routes the access matrix leaves out (see NOT_IN_MATRIX) that still take a body to fuzz.
 * Deleting the account: the body's password is wrong, so even a request that validated would
 * answer 400 and delete nothing.
 */
export const FUZZ_ONLY: Record<string, MatrixRoute> = {
  'POST /api/account/delete': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/account/delete',
    body: () => ({ password: 'not the password of anyone here' }),
  },
};

export const NOTHING_TO_FUZZ: Record<string, string> = {
  'POST /api/auth/sign-out': 'ends the caller’s session; no body, no path id',
  'POST /api/alerts/read-all': 'marks the caller’s alerts read; no body, no path id',
};

/**
 * Bookkeeping that requests change even when refused, left out of the "nothing written" check:
 * sessions (every answer rolls their expiry), idempotency keys (claimed before validation, released
 * after a refusal), alert deliveries (the background worker's), migrations. The sign-in throttle
 * is kept in memory, not in a table.
 */
export const BOOKKEEPING_TABLES = [
  'session',
  'idempotency_key',
  'alert_delivery',
  'schema_migration',
  'auth_throttle',
  'sign_in_address',
];

/** Columns the scheduler and push sender change in the background, so only the others are hashed. */
const STABLE_COLUMNS: Record<string, string[]> = {
  alert: ['id', 'account_id', 'kind', 'read_at', 'title', 'body'],
  push_subscription: ['id', 'account_id', 'endpoint'],
};

export interface FuzzWorld {
  t: TestApp;
  world: World;
  objects: ObjectSet;
  /** "METHOD /path" of every route, as Fastify registered it. */
  registered: Set<string>;
  /** The app's OpenAPI document: the fields each route's body declares. */
  openapi: OpenApi;
  close(): Promise<void>;
}

interface Schema {
  $ref?: string;
  properties?: Record<string, unknown>;
  allOf?: Schema[];
}
interface OpenApi {
  paths: Record<string, Record<string, { requestBody?: { content?: Record<string, { schema?: Schema }> } }>>;
  components?: { schemas?: Record<string, Schema> };
}

/** The top-level fields a route's JSON body declares in the OpenAPI document. */
function declaredFields(doc: OpenApi, key: string): string[] {
  const [method, path] = key.split(' ') as [string, string];
  const route = doc.paths[path.replace(/:(\w+)/g, '{$1}')]?.[method.toLowerCase()];
  const fields = new Set<string>();
  const visit = (schema: Schema | undefined): void => {
    if (!schema) return;
    if (schema.$ref) visit(doc.components?.schemas?.[schema.$ref.split('/').pop()!]);
    for (const field of Object.keys(schema.properties ?? {})) fields.add(field);
    for (const part of schema.allOf ?? []) visit(part);
  };
  for (const content of Object.values(route?.requestBody?.content ?? {})) visit(content.schema);
  return [...fields];
}

export async function startFuzzWorld(): Promise<FuzzWorld> {
  const handle = openDatabase(testConfig().databaseUrl, 1);
  await resetDatabase(handle.db);
  await handle.db.destroy();
  const bucket: TestBucket = await startTestBucket();
  const registered = new Set<string>();
  // FUZZ_LOG=1 prints the app's error log (the stack of a 5xx) while reproducing a failure.
  const logLevel = process.env.FUZZ_LOG ? 'error' : 'silent';
  const t = await createTestApp(
    { ...storageConfig(bucket), logLevel },
    {
      beforeConfigure: (fastify) =>
        fastify.addHook('onRoute', (route) => {
          for (const method of [route.method].flat()) registered.add(`${method} ${route.url}`);
        }),
    },
  );
  const world = await buildWorld(t);
  const objects = (await freshObjects(world)).A;
  const openapi = (await t.app.inject({ method: 'GET', url: '/api/docs/openapi.json' })).json<OpenApi>();
  return {
    t,
    world,
    objects,
    registered,
    openapi,
    close: async () => {
      await t.close();
      await bucket.stop();
    },
  };
}

/** One write route, ready to fuzz: who calls it, its valid URL and body, its parameters. */
export interface FuzzTarget extends RouteShape {
  key: string;
  method: string;
  role: RoleName;
  cookie: string | null;
  /** The valid URL split at '/', and the index of each parameter's segment. */
  segments: string[];
  paramAt: number[];
  /** The fields the route's body declares (OpenAPI), which an error may name though not sent. */
  declared: string[];
}

/** Prefers the owner of the objects, then whoever else the route lets through (instructor, admin). */
const PREFERENCE: RoleName[] = ['bakerA', 'instructorA', 'admin', 'bakerB', 'instructorOther', 'anonymous'];

export async function targetOf(fw: FuzzWorld, key: string): Promise<FuzzTarget> {
  const route: MatrixRoute | undefined = MATRIX[key] ?? FUZZ_ONLY[key];
  if (!route) throw new Error(`${key} is not in the access matrix: add it there first (it gives the valid body)`);
  const { world, objects } = fw;
  const role = PREFERENCE.find((r) => {
    const relation = route.on === 'caller' || r === 'anonymous' ? null : relationOf(world, r, 'A');
    return route.access.outcome(r, relation) === 'ok';
  });
  if (!role || !ROLES.includes(role)) throw new Error(`${key}: no role of the matrix may call it`);
  const url = typeof route.path === 'string' ? route.path : route.path(objects);
  const pattern = key.slice(key.indexOf(' ') + 1).split('/');
  const segments = url.split('?')[0]!.split('/');
  if (pattern.length !== segments.length) throw new Error(`${key}: ${url} does not match the pattern`);
  const paramAt = pattern.flatMap((s, i) => (s.startsWith(':') ? [i] : []));
  const ctx = {
    caller: world.callers[role],
    newEmail: () => uniqueEmail('fuzz'),
    spareEmail: world.spare.email,
    // The right shape, but no token of the database: minting one would write a row.
    resetToken: () => Promise.resolve(randomBytes(32).toString('base64url')),
  };
  const body = route.body ? await route.body(objects, ctx) : undefined;
  const template =
    body !== null && typeof body === 'object' && !Array.isArray(body) ? (body as Record<string, unknown>) : null;
  const caller = world.callers[role];
  // A route that ends or replaces its session (sign-in, should the fuzz get through) gets a
  // second session of the caller, as the matrix does, so the world's sessions stay signed in.
  const cookie =
    route.session === 'throwaway' && caller.email && caller.password
      ? await signInCookie(fw.t.app, caller.email, caller.password)
      : caller.cookie;
  return {
    key,
    method: key.slice(0, key.indexOf(' ')),
    role,
    cookie,
    segments,
    paramAt,
    params: paramAt.map((i) => pattern[i]!.slice(1)),
    declared: declaredFields(fw.openapi, key),
    template,
    upload: route.upload === true,
  };
}

export function urlOf(target: FuzzTarget, ids: (string | null)[]): string {
  const segments = [...target.segments];
  target.paramAt.forEach((at, i) => {
    const id = ids[i];
    if (id !== null && id !== undefined) segments[at] = id;
  });
  return segments.join('/');
}

export function sendFuzz(fw: FuzzWorld, target: FuzzTarget, request: FuzzRequest): Promise<InjectResponse> {
  const headers: Record<string, string> = { [IDEMPOTENCY_KEY_HEADER.toLowerCase()]: randomUUID() };
  if (target.cookie) headers.cookie = target.cookie;
  if (request.contentType !== undefined) headers['content-type'] = request.contentType;
  return fw.t.app.inject({
    method: target.method as 'POST',
    url: urlOf(target, request.ids),
    headers,
    ...(request.payload === undefined ? {} : { payload: request.payload }),
  });
}

/**
 * Why an answer to an invalid request is wrong, or null when it is right: a 4xx in the one error
 * shape (shared/src/contracts/errors.ts), whose details name a field that was sent, a path
 * parameter or the Idempotency-Key header.
 */
export function wrongAnswer(target: FuzzTarget, request: FuzzRequest, res: InjectResponse): string | null {
  if (res.statusCode < 400 || res.statusCode > 499) return `status ${res.statusCode}, not a 4xx`;
  if (!/^application\/json/.test(String(res.headers['content-type']))) {
    return `content type ${String(res.headers['content-type'])}`;
  }
  let body: ErrorResponse;
  try {
    body = JSON.parse(res.body) as ErrorResponse;
  } catch {
    return 'the body is not JSON';
  }
  if (body === null || typeof body !== 'object' || Array.isArray(body)) return 'the body is not an object';
  const keys = Object.keys(body)
    .filter((k) => k !== 'details')
    .sort();
  if (keys.join() !== 'error,message,statusCode') return `keys ${Object.keys(body).join(', ')}`;
  if (body.statusCode !== res.statusCode) return `statusCode ${String(body.statusCode)} ≠ ${res.statusCode}`;
  if (typeof body.error !== 'string' || body.error === '') return 'no error phrase';
  if (typeof body.message !== 'string' || body.message === '') return 'no message';
  if (/node_modules|\bat \S+ \(|\.ts:\d+:\d+/.test(body.message)) return 'the message carries a stack';
  if (!('details' in body)) return null;
  if (!Array.isArray(body.details) || body.details.length === 0) return 'details is not a non-empty array';
  // A detail may name a field that was sent, or one the valid body has (a required field left
  // out); Nest names a body that is not an object (an array, a number) "body".
  const named = new Set([
    ...request.keys.map(unescapeKey),
    ...Object.keys(target.template ?? {}),
    ...target.declared,
    ...target.params,
    IDEMPOTENCY_KEY_HEADER,
    'photos',
  ]);
  if (request.keys.length === 0) named.add('body');
  for (const detail of body.details) {
    if (detail === null || typeof detail !== 'object' || Object.keys(detail).sort().join() !== 'field,message') {
      return `a detail is not { field, message }: ${JSON.stringify(detail)}`;
    }
    if (typeof detail.field !== 'string' || typeof detail.message !== 'string' || detail.message === '') {
      return `a detail is not strings: ${JSON.stringify(detail)}`;
    }
    const head = detail.field.split('.')[0]!;
    // In a body that is an array, a path starts at an index ("0.0.0" deep inside it).
    const inArray =
      /^\d+$/.test(head) && typeof request.payload === 'string' && request.payload.trimStart().startsWith('[');
    if (!named.has(head) && !named.has(detail.field) && !inArray) {
      return `a detail names "${detail.field}", which was not sent`;
    }
  }
  return null;
}

/** A raw key as JSON.parse reads it (keys written with escapes on purpose, e.g. "\ud800"). */
function unescapeKey(key: string): string {
  return key.startsWith('"') ? (JSON.parse(key) as string) : key;
}

/**
 * Every table but the bookkeeping ones, hashed per table in one query (row count and content, so
 * an update that leaves the count alone shows too).
 */
export async function snapshot(fw: FuzzWorld): Promise<Map<string, string>> {
  const db = fw.t.db;
  const tables = await sql<{ name: string }>`
    SELECT table_name AS name FROM information_schema.tables
    WHERE table_schema = 'public' AND table_type = 'BASE TABLE'
      AND table_name <> ALL(${BOOKKEEPING_TABLES})
    ORDER BY table_name`.execute(db);
  const parts = tables.rows.map(({ name }) => {
    const columns = STABLE_COLUMNS[name];
    const row = columns ? sql.raw(columns.map((c) => `coalesce(t.${c}::text, '')`).join(" || ':' || ")) : sql`t::text`;
    return sql`SELECT ${name} AS name, count(*)::text || ' rows, ' || md5(coalesce(string_agg(${row}, ',' ORDER BY ${row}), '')) AS h FROM ${sql.table(name)} t`;
  });
  const result = await sql<{ name: string; h: string }>`${sql.join(parts, sql` UNION ALL `)}`.execute(db);
  return new Map(result.rows.map((r) => [r.name, r.h]));
}

/** Tables whose snapshot differs, with before → after. */
export function changedTables(before: Map<string, string>, after: Map<string, string>): string[] {
  return [...after]
    .filter(([name, h]) => before.get(name) !== h)
    .map(([name, h]) => `${name}: ${before.get(name)} → ${h}`);
}

/** Own property names of the built-in prototypes a polluting merge would touch. */
export function prototypeKeys(): string {
  return [Object.prototype, Array.prototype, Function.prototype, String.prototype, Number.prototype]
    .map((p) => Object.getOwnPropertyNames(p).sort().join(','))
    .join('|');
}
