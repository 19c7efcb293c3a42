// When PostgreSQL cannot be reached (restarting, crashed, the network between), a request fails
// with one of these; the API answers 503 with Retry-After rather than a 500, since the same
// request will work once the database is back (the pool reconnects by itself).

/** SQLSTATE classes and codes that mean "no database just now" (PostgreSQL manual, Appendix A). */
const UNAVAILABLE_SQLSTATES = new Set([
  '57P01', // admin_shutdown
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now (starting up, recovering)
  '08000', // connection_exception
  '08001', // sqlclient_unable_to_establish_sqlconnection
  '08003', // connection_does_not_exist
  '08006', // connection_failure
]);

/** Socket errors from Node when the server is gone or not listening. */
const UNAVAILABLE_ERRNOS = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH']);

/** node-postgres reports a dropped connection and a pool that cannot connect in time by message only. */
const UNAVAILABLE_MESSAGES = [
  /^Connection terminated/,
  /^timeout exceeded when trying to connect/,
  /^Client has encountered a connection error and is not queryable/,
  /^Cannot use a pool after calling end on the pool/,
];

export const DATABASE_RETRY_AFTER_SECONDS = 5;

export function isDatabaseUnavailable(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && depth < 5; depth++) {
    const { code, message } = e as { code?: unknown; message?: unknown };
    if (typeof code === 'string' && (UNAVAILABLE_SQLSTATES.has(code) || UNAVAILABLE_ERRNOS.has(code))) return true;
    if (typeof message === 'string' && UNAVAILABLE_MESSAGES.some((m) => m.test(message))) return true;
    // AggregateError (a refused connection tried on IPv4 and IPv6) and wrapped causes.
    const inner = (e as { errors?: unknown[] }).errors?.[0];
    e = inner ?? (e as { cause?: unknown }).cause;
  }
  return false;
}
