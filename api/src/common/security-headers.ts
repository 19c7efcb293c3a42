import helmet from '@fastify/helmet';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { FastifyInstance } from 'fastify';

/** One year, the usual HSTS preload minimum (hstspreload.org asks for at least 31536000). */
const HSTS = 'max-age=31536000; includeSubDomains';

/**
 * Response headers that ask the browser to hold back (helmet), plus two of our own:
 * - Strict-Transport-Security only when the app is reached over https (a request that came in
 *   over TLS, or a PUBLIC_URL that is https because a proxy terminates TLS in front of us). Over
 *   plain http it would be meaningless, and on a developer's 127.0.0.1 it would do harm.
 * - Cache-Control: no-store on every API answer that does not set its own, so signed-in data is
 *   not kept in shared or back/forward caches. The photo image route sets `private, max-age=…`
 *   itself and keeps it.
 */
export async function registerSecurityHeaders(
  app: NestFastifyApplication,
  fastify: FastifyInstance,
  publicUrl: string,
): Promise<void> {
  await app.register(helmet, {
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        // The built index.html loads its scripts from files (Vite); no inline script anywhere,
        // and no inline event handlers either.
        scriptSrc: ["'self'"],
        scriptSrcAttr: ["'none'"],
        // MUI styles through emotion, which inserts <style> tags at run time; without a nonce
        // plumbed through every page (and emotion's cache) they need 'unsafe-inline'. Inline
        // styles cannot run script, so this is the usual, accepted exception.
        styleSrc: ["'self'", "'unsafe-inline'"],
        // data: for MUI's inline SVG icons, blob: for photo previews before upload.
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        workerSrc: ["'self'"],
        manifestSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'none'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'"],
      },
    },
    // frame-ancestors above does this for current browsers; X-Frame-Options for older ones.
    frameguard: { action: 'deny' },
    // no-referrer: a password-reset page carries its token in the URL; no link may pass it on.
    referrerPolicy: { policy: 'no-referrer' },
    // Sent by the hook below, only over https.
    hsts: false,
  });

  const httpsBehindProxy = publicUrl.startsWith('https://');
  fastify.addHook('onSend', async (request, reply) => {
    if (httpsBehindProxy || request.protocol === 'https') reply.header('strict-transport-security', HSTS);
    const path = request.url;
    if (
      (path === '/api' || path.startsWith('/api/') || path.startsWith('/api?')) &&
      !reply.hasHeader('cache-control')
    ) {
      reply.header('cache-control', 'no-store');
    }
  });
}
