import { describe, expect, it } from 'vitest';
import type { AppConfig } from '../config.js';
import { PasswordService } from './password.service.js';

function service(passwordHashCost: number): PasswordService {
  const config: AppConfig = {
    databaseUrl: 'postgres://unused',
    host: '127.0.0.1',
    port: 0,
    sessionSecret: 'x'.repeat(32),
    webDist: null,
    logLevel: 'silent',
    passwordHashCost,
    sessionPruneSeconds: 0,
    authAttemptsPerMinute: 10,
    mail: { smtpUrl: 'smtp://127.0.0.1:9', from: 'x@example.com', publicUrl: 'http://127.0.0.1', devMailUrl: null },
  };
  return new PasswordService(config);
}

const FORMAT = /^scrypt\$(\d+)\$(\d+)\$(\d+)\$([A-Za-z0-9+/]+=*)\$([A-Za-z0-9+/]+=*)$/;
const PASSWORD = 'a rye levain at 75 % hydration';

describe('PasswordService', () => {
  const fast = service(14);

  it('hashes to scrypt$<log2 N>$<r>$<p>$<salt>$<key> with a 16-byte salt and a 32-byte key', async () => {
    const hash = await fast.hash(PASSWORD);
    const match = FORMAT.exec(hash);
    expect(match, hash).not.toBeNull();
    const [, logN, r, p, salt, key] = match!;
    expect([logN, r, p]).toEqual(['14', '8', '1']);
    expect(Buffer.from(salt!, 'base64')).toHaveLength(16);
    expect(Buffer.from(key!, 'base64')).toHaveLength(32);
    expect(hash).not.toContain(PASSWORD);
  });

  it('verifies the right password and refuses a wrong one', async () => {
    const hash = await fast.hash(PASSWORD);
    expect(await fast.verify(PASSWORD, hash)).toBe(true);
    expect(await fast.verify(`${PASSWORD} `, hash)).toBe(false);
    expect(await fast.verify(PASSWORD.toUpperCase(), hash)).toBe(false);
    expect(await fast.verify('', hash)).toBe(false);
  });

  it('salts every hash: the same password twice gives different salts and keys', async () => {
    const [a, b] = await Promise.all([fast.hash(PASSWORD), fast.hash(PASSWORD)]);
    expect(a).not.toBe(b);
    expect(a.split('$')[4]).not.toBe(b.split('$')[4]);
    expect(a.split('$')[5]).not.toBe(b.split('$')[5]);
    expect(await fast.verify(PASSWORD, a)).toBe(true);
    expect(await fast.verify(PASSWORD, b)).toBe(true);
  });

  it('verifies a hash made at another cost: the stored string carries its own parameters', async () => {
    const hashedAt14 = await fast.hash(PASSWORD);
    const at15 = service(15);
    expect(await at15.verify(PASSWORD, hashedAt14)).toBe(true);
    expect(await at15.verify('wrong password here', hashedAt14)).toBe(false);

    const hashedAt15 = await at15.hash(PASSWORD);
    expect(hashedAt15.split('$')[1]).toBe('15');
    expect(await fast.verify(PASSWORD, hashedAt15)).toBe(true);
  });

  it('treats canonically equivalent spellings as the same password (NFKC)', async () => {
    const composed = 'pâte fermentée'; // â and é as single code points
    const decomposed = composed.normalize('NFD'); // letter + combining accent
    expect(decomposed).not.toBe(composed);
    const hash = await fast.hash(composed);
    expect(await fast.verify(decomposed, hash)).toBe(true);
  });

  it('answers false, without throwing, for a stored string that is not one of its hashes', async () => {
    const hash = await fast.hash(PASSWORD);
    for (const stored of ['', 'plain text', hash.replace(/^scrypt/, 'bcrypt'), hash.split('$').slice(0, 5).join('$')]) {
      expect(await fast.verify(PASSWORD, stored), stored).toBe(false);
    }
  });

  it('verifyNothing spends a real check and always answers false', async () => {
    expect(await fast.verifyNothing(PASSWORD)).toBe(false);
    expect(await fast.verifyNothing('')).toBe(false);
  });
});
