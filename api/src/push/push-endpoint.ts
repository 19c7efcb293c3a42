import { isIP } from 'node:net';

/**
 * Why an endpoint a browser sent may not be posted to, or null when it may. The API makes
 * requests to these URLs, so a hostile client could aim them at our own network (SSRF): outside
 * development only public https hosts are accepted. (A public name that resolves to a private
 * address is not caught here; production should also egress through a proxy that refuses those.)
 */
export function pushEndpointProblem(endpoint: string, allowPrivate: boolean): string | null {
  let url: URL;
  try {
    url = new URL(endpoint);
  } catch {
    return 'Not a URL.';
  }
  if (url.protocol !== 'https:') return 'A push endpoint must use https.';
  if (url.username || url.password) return 'A push endpoint carries no user name or password.';
  if (allowPrivate) return null;
  const host = url.hostname.replace(/^\[|\]$/g, '').toLowerCase();
  if (host === 'localhost' || host.endsWith('.localhost') || host.endsWith('.local') || !host.includes('.'))
    return 'A push endpoint must be a public host.';
  if (isIP(host) && isPrivateAddress(host)) return 'A push endpoint must be a public host.';
  return null;
}

/** Loopback, private, link-local, CGNAT and unique-local ranges (RFC 1918, 6598, 3927, 4193, 4291). */
export function isPrivateAddress(ip: string): boolean {
  if (isIP(ip) === 4) {
    const [a = 0, b = 0] = ip.split('.').map(Number);
    return (
      a === 0 ||
      a === 10 ||
      a === 127 ||
      (a === 100 && b >= 64 && b <= 127) ||
      (a === 169 && b === 254) ||
      (a === 172 && b >= 16 && b <= 31) ||
      (a === 192 && b === 168)
    );
  }
  const v6 = ip.toLowerCase();
  if (v6 === '::' || v6 === '::1') return true;
  if (v6.startsWith('::ffff:')) return isPrivateAddress(v6.slice(7));
  return /^(fc|fd|fe8|fe9|fea|feb)/.test(v6);
}
