import { describe, expect, it } from 'vitest';
import { joinCodeProblem, normalizeJoinCode } from './join-code';

describe('normalizeJoinCode', () => {
  it('takes lower case, spaces and dashes as typed from a slide', () => {
    expect(normalizeJoinCode('wxyz-2345')).toBe('WXYZ2345');
    expect(normalizeJoinCode(' WXYZ 2345 ')).toBe('WXYZ2345');
    expect(normalizeJoinCode('wx yz–23 45')).toBe('WXYZ2345');
  });
});

describe('joinCodeProblem', () => {
  it('accepts a whole code in any spelling', () => {
    expect(joinCodeProblem('abcd-efgh')).toBeNull();
    expect(joinCodeProblem('HJKM 2345')).toBeNull();
  });

  it('asks for a code when there is none', () => {
    expect(joinCodeProblem('  - ')).toMatch(/Enter the code/);
  });

  it('counts the characters of a short or long code', () => {
    expect(joinCodeProblem('ABCD-EFG')).toBe('A join code has 8 characters; this has 7.');
    expect(joinCodeProblem('ABCDEFGHJ')).toBe('A join code has 8 characters; this has 9.');
  });

  it('points out look-alikes the alphabet leaves out', () => {
    expect(joinCodeProblem('ABCD-EF0H')).toMatch(/never use I, O, 0 or 1/);
    expect(joinCodeProblem('ABCD EFGI')).toMatch(/never use I, O, 0 or 1/);
  });

  it('refuses other characters', () => {
    expect(joinCodeProblem('ABCD!EFG')).toMatch(/only letters and digits/);
  });
});
