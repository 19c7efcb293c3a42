/** Query parameter that carries where to go back to after signing in. */
export const NEXT_PARAM = 'next';

const AUTH_PATHS = ['/sign-in', '/sign-up'];

/**
 * Where to go after signing in. Only same-site paths are honoured: `//evil.example` and
 * `/\evil.example` are protocol-relative URLs in browsers, so an open redirect if followed.
 */
export function safeNextPath(raw: string | null | undefined): string {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\')) return '/';
  const pathname = raw.split(/[?#]/, 1)[0] ?? '';
  if (AUTH_PATHS.includes(pathname)) return '/';
  return raw;
}

/** `/sign-in?next=…` for a page someone tried to open while signed out. */
export function signInPathFor(pathWithSearch: string): string {
  const next = safeNextPath(pathWithSearch);
  return next === '/' ? '/sign-in' : `/sign-in?${NEXT_PARAM}=${encodeURIComponent(next)}`;
}
