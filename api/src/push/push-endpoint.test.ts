import { describe, expect, it } from 'vitest';
import { isPrivateAddress, pushEndpointProblem } from './push-endpoint.js';

// Address ranges from RFC 1918 (private), RFC 6598 (shared/CGNAT), RFC 3927 (link-local),
// RFC 4193 (IPv6 unique local) and RFC 4291 (loopback, link-local).
describe('push endpoints a browser may register', () => {
  it('accepts a public https push service', () => {
    expect(pushEndpointProblem('https://push.example.net/send/abc123', false)).toBeNull();
  });

  it('refuses plain http, credentials and non-URLs', () => {
    expect(pushEndpointProblem('http://push.example.net/x', false)).toMatch(/https/);
    expect(pushEndpointProblem('https://user:pw@push.example.net/x', false)).toMatch(/password/);
    expect(pushEndpointProblem('not a url', false)).toBe('Not a URL.');
  });

  it('refuses our own network outside development', () => {
    for (const host of [
      '127.0.0.1',
      '10.1.2.3',
      '172.20.0.1',
      '192.168.1.5',
      '169.254.169.254',
      '100.64.0.1',
      '[::1]',
      '[fd00::1]',
      'localhost',
      'intranet',
    ])
      expect(pushEndpointProblem(`https://${host}:8443/p`, false), host).toMatch(/public host/);
    expect(pushEndpointProblem('https://127.0.0.1:2527/push/x', true)).toBeNull();
  });

  it('tells private from public addresses', () => {
    expect(isPrivateAddress('172.15.255.255')).toBe(false);
    expect(isPrivateAddress('172.16.0.0')).toBe(true);
    expect(isPrivateAddress('8.8.8.8')).toBe(false);
    expect(isPrivateAddress('::ffff:10.0.0.1')).toBe(true);
    expect(isPrivateAddress('2001:db8::1')).toBe(false);
  });
});
