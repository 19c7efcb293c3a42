import { ForbiddenException } from '@nestjs/common';
import type { FastifyInstance, FastifyRequest } from 'fastify';
import { toErrorResponse } from './error.filter.js';

const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

export const CROSS_SITE_REFUSED =
  'This request came from another site, so it was refused. Open Peakwise itself and try again.';

export interface CsrfOptions {
  /** The app's own origin as the outside world sees it (config publicUrl). */
  publicOrigin: string;
  /** Other origins allowed to call the API (CORS_ORIGINS); they may write too. */
  trustedOrigins: readonly string[];
}

function header(request: FastifyRequest, name: string): string | undefined {
  const value = request.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

/**
 * Whether a write may go ahead. Browsers tell us where a request comes from:
 * - Sec-Fetch-Site (Fetch Metadata, sent by current browsers on every request): `same-origin`
 *   and `none` (typed or bookmarked by the user) pass; `same-site` or `cross-site` pass only from
 *   a configured origin, as does anything else, which is refused.
 * - Otherwise Origin (sent by browsers on every cross-origin request and on same-origin POSTs):
 *   it must be the app's own origin (publicUrl, or the Host the request was sent to) or a
 *   configured one. `Origin: null` (sandboxed frames, some redirects) is refused.
 * - Neither header: not a browser acting for someone on another site (curl, scripts, tests,
 *   which hold no one's cookie), or a browser too old to send Origin; such a browser also keeps
 *   our SameSite=Lax cookie off cross-site POSTs, so the request carries no session. Allowed.
 * No custom header is required: every write from our own pages already passes the checks above,
 * and Origin cannot be set by a page's script.
 */
export function isWriteAllowed(request: FastifyRequest, options: CsrfOptions): boolean {
  const origin = header(request, 'origin');
  const fromTrusted = origin !== undefined && options.trustedOrigins.includes(origin);
  const site = header(request, 'sec-fetch-site');
  if (site !== undefined) return site === 'same-origin' || site === 'none' || fromTrusted;
  if (origin === undefined) return true;
  if (fromTrusted || origin === options.publicOrigin) return true;
  const host = header(request, 'host');
  return host !== undefined && origin === `${request.protocol}://${host}`;
}

/**
 * Refuses cross-site writes before anything else runs (no session is loaded, no body is read
 * into a handler): 403 in the one error shape. Covers every write, cookie or not, so sign-in and
 * sign-up cannot be forged from another site either (login CSRF).
 */
export function registerCsrfCheck(fastify: FastifyInstance, options: CsrfOptions): void {
  fastify.addHook('onRequest', async (request, reply) => {
    if (!WRITES.has(request.method) || isWriteAllowed(request, options)) return;
    await reply
      .status(403)
      .type('application/json; charset=utf-8')
      .send(toErrorResponse(new ForbiddenException(CROSS_SITE_REFUSED)));
  });
}
