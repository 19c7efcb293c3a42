import { createHash } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { ThrottlerStorage } from '@nestjs/throttler';
import { AuthThrottleRepository } from './auth-throttle.repository.js';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/** SHA-256 hex, so the table holds no address or e-mail in the clear. */
export function throttleKey(...parts: string[]): string {
  return createHash('sha256').update(parts.join('\u0000')).digest('hex');
}

/**
 * @nestjs/throttler's storage in PostgreSQL instead of process memory, so every API process
 * counts against the same allowance. The guard hands us a key it has already hashed per route,
 * throttler name and client address.
 */
@Injectable()
export class PgThrottlerStorage implements ThrottlerStorage {
  constructor(private readonly repository: AuthThrottleRepository) {}

  async increment(
    key: string,
    ttl: number,
    limit: number,
    blockDuration: number,
    throttlerName: string,
  ): Promise<ThrottlerStorageRecord> {
    const count = await this.repository.hit(throttleKey('throttler', throttlerName, key), ttl, limit, blockDuration);
    return {
      totalHits: count.hits,
      timeToExpire: count.secondsToExpire,
      isBlocked: count.secondsBlocked > 0,
      timeToBlockExpire: count.secondsBlocked,
    };
  }
}
