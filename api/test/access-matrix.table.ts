import { pushSubscription } from './access-matrix.classroom.js';
import { BENCH_ROUTES } from './access-matrix.table-bench.js';
import { CLASSROOM_ROUTES } from './access-matrix.table-classroom.js';
import { LOGBOOK_ROUTES } from './access-matrix.table-logbook.js';
import { PHOTO_ROUTES } from './access-matrix.table-photo.js';
import { PASSWORD } from './helpers.js';
import {
  ADMIN_ONLY,
  OWNER_ONLY,
  PUBLIC,
  SIGNED_IN,
  type Caller,
  type MarkerKind,
  type ObjectSet,
  type Policy,
} from './access-matrix.model.js';

// Every route the app registers, keyed "METHOD /path" as Fastify has it, and what each role must
// get. access-matrix.api.test.ts fails on a route missing here (and on an entry the app lacks), so
// a new route cannot ship without saying who may use it.

/** What a body builder may use besides the target's ids. */
export interface BodyContext {
  caller: Caller;
  /** A fresh e-mail nobody has used. */
  newEmail(): string;
  /** The e-mail of an account outside the matrix (for password-reset requests). */
  spareEmail: string;
  /** A usable reset token of that spare account. */
  resetToken(): Promise<string>;
}

export interface MatrixRoute {
  access: Policy;
  /**
   * `objects`: tried on baker A's and on baker B's objects (the path or the body names them), so
   * each role meets an object it owns, one shared with it, or a foreign one. `caller`: tried once;
   * the route acts on the caller's own account or makes something new. `class-logs`: as objects,
   * and also each party's log asked through the other party's class (an instructor's own class
   * with someone else's culture id must not open it).
   */
  on: 'objects' | 'class-logs' | 'caller';
  path: string | ((o: ObjectSet) => string);
  /** A valid body, so a refused write is refused for access and not for a missing field. */
  body?: (o: ObjectSet, ctx: BodyContext) => unknown;
  /** Sent as a multipart upload of one small JPEG (the photos field), instead of a JSON body. */
  upload?: true;
  /** `throwaway`: sent in a second session of the caller, as the route ends or replaces its session. */
  session?: 'throwaway';
  /**
   * What the route leaves unusable for the next (DELETE routes always do): `objects` are made
   * anew; `classes`: it changes who is in which class, so the classes are started over too.
   */
  spoils?: 'objects' | 'classes';
  /** What of another baker's data a 2xx may carry: to the instructor it is shared with, to an admin. */
  reveals?: { shared?: MarkerKind[]; admin?: MarkerKind[] };
}

/** Routes the matrix does not try, each with its reason. HEAD twins of GET routes are skipped by rule. */
export const NOT_IN_MATRIX: Record<string, string> = {
  'POST /api/account/delete':
    'deletes the caller’s own account (no id to point at another’s), which would end the matrix’s roles; photo-access.api.test.ts deletes one with its password and checks anonymous → 401',
  'GET /api/dev/mail':
    'development mailbox: loaded only outside production (config.ts); public by design and reads the fake SMTP server, no database rows',
  'GET /api/dev/push':
    'development push inbox: loaded only when the fake push service is configured (never in production or these tests)',
  'GET /api/docs':
    'Swagger UI of the OpenAPI document: static, public, no rows (openapi.api.test.ts checks the document)',
  'GET /api/docs/': 'Swagger UI, as above',
  'GET /api/docs/*': 'Swagger UI assets, as above',
  'GET /api/docs/docs/*': 'Swagger UI assets, as above',
  'GET /api/docs/LICENSE': 'Swagger UI assets, as above',
  'GET /api/docs/index.html': 'Swagger UI, as above',
  'GET /api/docs/swagger-ui-init.js': 'Swagger UI assets, as above',
  'GET /api/docs/docs/swagger-ui-init.js': 'Swagger UI assets, as above',
  'GET /api/docs/openapi.json': 'the OpenAPI document: public, no rows',
  'GET /api/docs-yaml': 'the OpenAPI document as YAML: public, no rows',
  'GET /*': 'the web app’s static files, registered only when webDist is set (not in tests): no rows',
};

const ACCOUNT_ROUTES: Record<string, MatrixRoute> = {
  'GET /api/health': { access: PUBLIC, on: 'caller', path: '/api/health' },

  'POST /api/auth/sign-up': {
    access: PUBLIC,
    on: 'caller',
    path: '/api/auth/sign-up',
    body: (_o, ctx) => ({ email: ctx.newEmail(), displayName: 'Juniper Hale', password: 'a warm jar on the shelf' }),
    session: 'throwaway',
  },
  // Anonymous signs in with the spare account; everyone else with their own credentials.
  'POST /api/auth/sign-in': {
    access: PUBLIC,
    on: 'caller',
    path: '/api/auth/sign-in',
    body: (_o, ctx) =>
      ctx.caller.email
        ? { email: ctx.caller.email, password: ctx.caller.password }
        : { email: ctx.spareEmail, password: PASSWORD },
    session: 'throwaway',
  },
  'POST /api/auth/sign-out': { access: PUBLIC, on: 'caller', path: '/api/auth/sign-out', session: 'throwaway' },
  'POST /api/auth/password-reset': {
    access: PUBLIC,
    on: 'caller',
    path: '/api/auth/password-reset',
    body: (_o, ctx) => ({ email: ctx.spareEmail }),
  },
  // The token is the authority here, not the session: anyone holding a live one may use it.
  'POST /api/auth/password-reset/confirm': {
    access: PUBLIC,
    on: 'caller',
    path: '/api/auth/password-reset/confirm',
    body: async (_o, ctx) => ({ token: await ctx.resetToken(), password: PASSWORD }),
  },

  'GET /api/account': { access: SIGNED_IN, on: 'caller', path: '/api/account' },
  'PATCH /api/account': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/account',
    body: () => ({ unitSystem: 'metric' }),
  },
  // The same password again: a real change (hash, other sessions ended) that leaves later sign-ins working.
  'POST /api/account/password': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/account/password',
    body: (_o, ctx) => ({ currentPassword: ctx.caller.password, newPassword: ctx.caller.password }),
  },
  'GET /api/account/export.json': { access: SIGNED_IN, on: 'caller', path: '/api/account/export.json' },
  'GET /api/account/alert-preferences': { access: SIGNED_IN, on: 'caller', path: '/api/account/alert-preferences' },
  'PATCH /api/account/alert-preferences': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/account/alert-preferences',
    body: () => ({ leadMinutes: 30 }),
  },

  // A student's comment reaches their instructor as an alert naming the student and the culture.
  'GET /api/alerts': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/alerts',
    reveals: { shared: ['account', 'logbook'] },
  },
  'GET /api/alerts/unread-count': { access: SIGNED_IN, on: 'caller', path: '/api/alerts/unread-count' },
  'POST /api/alerts/read-all': { access: SIGNED_IN, on: 'caller', path: '/api/alerts/read-all' },
  'POST /api/alerts/:id/read': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/alerts/${o.alertId}/read` },

  'GET /api/admin/accounts': {
    access: ADMIN_ONLY,
    on: 'caller',
    path: '/api/admin/accounts?limit=200',
    reveals: { admin: ['account'] },
  },
  // "baker" again: a real write that leaves the matrix's roles as they are.
  'PATCH /api/admin/accounts/:id/role': {
    access: ADMIN_ONLY,
    on: 'objects',
    path: (o) => `/api/admin/accounts/${o.accountId}/role`,
    body: () => ({ role: 'baker' }),
    reveals: { admin: ['account'] },
  },
  // Enabling: a disabling body would sign baker A out partway through the matrix.
  'PATCH /api/admin/accounts/:id/status': {
    access: ADMIN_ONLY,
    on: 'objects',
    path: (o) => `/api/admin/accounts/${o.accountId}/status`,
    body: () => ({ disabled: false }),
    reveals: { admin: ['account'] },
  },
};

// Web push: the key is the same for everyone signed in; a device belongs to its account alone.
const PUSH_ROUTES: Record<string, MatrixRoute> = {
  'GET /api/push/key': { access: SIGNED_IN, on: 'caller', path: '/api/push/key' },
  'GET /api/push/subscriptions': { access: SIGNED_IN, on: 'caller', path: '/api/push/subscriptions' },
  'POST /api/push/subscriptions': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/push/subscriptions',
    body: () => pushSubscription(),
  },
  'DELETE /api/push/subscriptions/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/push/subscriptions/${o.pushDeviceId}`,
  },
  'POST /api/push/subscriptions/:id/test': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/push/subscriptions/${o.pushDeviceId}/test`,
  },
};

export const MATRIX: Record<string, MatrixRoute> = {
  ...ACCOUNT_ROUTES,
  ...LOGBOOK_ROUTES,
  ...BENCH_ROUTES,
  ...CLASSROOM_ROUTES,
  ...PUSH_ROUTES,
  ...PHOTO_ROUTES,
};
