import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPathFor } from './next-path';

describe('safeNextPath', () => {
  it('keeps a same-site path with its query', () => {
    expect(safeNextPath('/account?tab=password')).toBe('/account?tab=password');
  });

  it.each([null, undefined, '', 'account', 'https://evil.example/', '//evil.example', '/\\evil.example'])(
    'falls back to home for %s',
    (raw) => {
      expect(safeNextPath(raw)).toBe('/');
    },
  );

  it('never loops back to the sign-in or sign-up page', () => {
    expect(safeNextPath('/sign-in?next=/account')).toBe('/');
    expect(safeNextPath('/sign-up')).toBe('/');
  });
});

describe('signInPathFor', () => {
  it('carries the page to come back to', () => {
    expect(signInPathFor('/admin/accounts?offset=20')).toBe('/sign-in?next=%2Fadmin%2Faccounts%3Foffset%3D20');
  });

  it('leaves the parameter off for home', () => {
    expect(signInPathFor('/')).toBe('/sign-in');
  });
});
