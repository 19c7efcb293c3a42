import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config.js';

const KEY_LENGTH = 32;
const R = 8;
const P = 1;

function scryptAsync(password: string, salt: Buffer, options: ScryptOptions): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    scrypt(password.normalize('NFKC'), salt, KEY_LENGTH, options, (error, key) =>
      error ? reject(error) : resolve(key),
    );
  });
}

function memoryFor(n: number, r: number): number {
  // scrypt needs 128·N·r bytes; Node refuses above `maxmem`, so give it that plus headroom.
  return 128 * n * r + 16 * 1024 * 1024;
}

/**
 * scrypt from Node's crypto (OWASP Password Storage Cheat Sheet: N = 2^17, r = 8, p = 1). The
 * stored string carries its own parameters — `scrypt$<log2 N>$<r>$<p>$<salt>$<key>` — so the cost
 * can be raised later without breaking existing passwords.
 */
@Injectable()
export class PasswordService {
  private dummyHash: Promise<string> | null = null;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  async hash(password: string): Promise<string> {
    const logN = this.config.passwordHashCost;
    const n = 2 ** logN;
    const salt = randomBytes(16);
    const key = await scryptAsync(password, salt, { N: n, r: R, p: P, maxmem: memoryFor(n, R) });
    return ['scrypt', logN, R, P, salt.toString('base64'), key.toString('base64')].join('$');
  }

  async verify(password: string, stored: string): Promise<boolean> {
    const [scheme, logN, r, p, salt, key] = stored.split('$');
    if (scheme !== 'scrypt' || !logN || !r || !p || !salt || !key) return false;
    const n = 2 ** Number(logN);
    const expected = Buffer.from(key, 'base64');
    const actual = await scryptAsync(password, Buffer.from(salt, 'base64'), {
      N: n,
      r: Number(r),
      p: Number(p),
      maxmem: memoryFor(n, Number(r)),
    });
    return actual.length === expected.length && timingSafeEqual(actual, expected);
  }

  /** Spends the same time as a real check, so an unknown e-mail cannot be told apart by timing. */
  async verifyNothing(password: string): Promise<false> {
    this.dummyHash ??= this.hash(randomBytes(12).toString('hex'));
    await this.verify(password, await this.dummyHash);
    return false;
  }
}
