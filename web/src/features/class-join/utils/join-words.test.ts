import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { classDates, inviteProblem } from './join-words';

const apiError = (statusCode: number, message = 'x') => new ApiError({ statusCode, error: 'e', message });

describe('classDates', () => {
  it('names the year once for a class within one year', () => {
    expect(classDates('2027-01-09', '2027-02-13')).toBe('Sat 9 Jan – Sat 13 Feb 2027');
  });

  it('names both years for a class across New Year', () => {
    expect(classDates('2026-12-05', '2027-01-16')).toBe('Sat 5 Dec 2026 – Sat 16 Jan 2027');
  });
});

describe('inviteProblem', () => {
  it('keeps the server’s reason for a spent link', () => {
    const p = inviteProblem(apiError(410, 'This invitation has expired. Ask your instructor.'), 'theo@example.test');
    expect(p).toMatchObject({ kind: 'gone', message: 'This invitation has expired. Ask your instructor.' });
  });

  it('names the signed-in account for a link sent to another address', () => {
    const p = inviteProblem(apiError(403, 'This invitation was sent to another address.'), 'theo@example.test');
    expect(p.kind).toBe('other-account');
    expect(p).toMatchObject({
      message: 'This invitation was sent to another address.',
      signedInAs: 'theo@example.test',
    });
  });

  it('tells an unknown link from a failed load', () => {
    expect(inviteProblem(apiError(404), 'a@b.test').kind).toBe('unknown');
    expect(inviteProblem(apiError(500, 'Down for a moment.'), 'a@b.test')).toMatchObject({
      kind: 'failed',
      message: 'Down for a moment.',
    });
  });
});
