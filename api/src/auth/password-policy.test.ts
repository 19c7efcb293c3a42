import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@peakwise/shared';
import { dictionary } from '@zxcvbn-ts/language-common';
import { describe, expect, it } from 'vitest';
import { passwordProblem } from './password-policy.js';

/** Ordinary lower-case words cut to exactly `length` characters. */
function words(length: number): string {
  return 'bulk fermentation at twenty four degrees '.repeat(10).slice(0, length);
}

describe('passwordProblem: length', () => {
  it('uses the shared limits of 8 and 128 (ASVS 6.2.1 and 6.2.9 ask for at least 8 and 64)', () => {
    expect(PASSWORD_MIN_LENGTH).toBe(8);
    expect(PASSWORD_MAX_LENGTH).toBe(128);
  });

  it('refuses 7 characters and accepts 8', () => {
    expect(passwordProblem(words(7))).toMatch(/at least 8/);
    expect(passwordProblem(words(8))).toBeNull();
  });

  it('accepts 64 and 128 characters and refuses 129', () => {
    expect(passwordProblem(words(64))).toBeNull();
    expect(passwordProblem(words(128))).toBeNull();
    expect(passwordProblem(words(129))).toMatch(/at most 128/);
  });

  it('counts characters, not UTF-16 units or bytes', () => {
    const bread = '🍞'; // one character, two UTF-16 units, four UTF-8 bytes
    expect(bread.length).toBe(2);
    expect(Buffer.byteLength(bread)).toBe(4);
    // 7 emoji are 14 units (would pass a `.length >= 8` check) but only 7 characters.
    expect(passwordProblem(bread.repeat(7))).toMatch(/at least 8/);
    expect(passwordProblem(bread.repeat(8))).toBeNull();
    // 128 emoji are 256 units and 512 bytes, yet exactly the maximum.
    expect(passwordProblem(bread.repeat(128))).toBeNull();
    expect(passwordProblem(bread.repeat(129))).toMatch(/at most 128/);
  });

  it('counts accented letters as one character each', () => {
    const word = 'crème brûlée levain'; // precomposed: 19 characters
    expect([...word]).toHaveLength(19);
    expect(passwordProblem(word)).toBeNull();
    expect(passwordProblem('é'.repeat(7))).toMatch(/at least 8/);
  });
});

describe('passwordProblem: common passwords', () => {
  const list = dictionary['passwords-common'];

  it('refuses passwords from the zxcvbn common list that are long enough to pass the length rule', () => {
    const long = list.filter((p) => [...p].length >= PASSWORD_MIN_LENGTH);
    expect(long.length).toBeGreaterThan(1000);
    // The first few, the last one and a couple from the middle of the list.
    const sample = [...long.slice(0, 5), long[Math.floor(long.length / 2)]!, long.at(-1)!];
    for (const password of sample) expect(passwordProblem(password), password).toMatch(/too common/);
  });

  it('refuses them in any letter case', () => {
    expect(list).toContain('password123');
    expect(passwordProblem('password123')).toMatch(/too common/);
    expect(passwordProblem('PASSWORD123')).toMatch(/too common/);
    expect(passwordProblem('PassWord123')).toMatch(/too common/);
  });

  it('accepts a passphrase that is not on the list', () => {
    const password = 'my starter smells like green apples';
    expect(list).not.toContain(password);
    expect(passwordProblem(password)).toBeNull();
  });
});

describe('passwordProblem: no composition rules (ASVS 6.2.5)', () => {
  it('accepts only lower-case letters, only digits that are not common, or only symbols', () => {
    const list = dictionary['passwords-common'];
    for (const password of ['sourdoughstarterjar', '8305729164738291', '~!@#$%^&*()_+{}|']) {
      expect(list).not.toContain(password);
      expect(passwordProblem(password), password).toBeNull();
    }
  });
});

describe('passwordProblem: personal information', () => {
  const email = 'ines.marlow@example.com';
  const name = 'Ines Marlow';

  it('refuses the e-mail address, in any case', () => {
    expect(passwordProblem(email, [email, name])).toMatch(/e-mail or name/);
    expect(passwordProblem(email.toUpperCase(), [email, name])).toMatch(/e-mail or name/);
  });

  it('refuses the part of the e-mail before the @', () => {
    expect(passwordProblem('ines.marlow', [email, name])).toMatch(/e-mail or name/);
  });

  it('refuses the name, in any case and ignoring its surrounding spaces', () => {
    expect(passwordProblem('ines marlow', [email, name])).toMatch(/e-mail or name/);
    expect(passwordProblem('INES MARLOW', [email, ` ${name} `])).toMatch(/e-mail or name/);
  });

  it('accepts a password that merely contains the name among other words', () => {
    expect(passwordProblem('ines marlow bakes rye on sundays', [email, name])).toBeNull();
  });

  it('accepts the same password for someone else', () => {
    expect(passwordProblem('ines marlow', ['theo@example.com', 'Theo Park'])).toBeNull();
  });
});
