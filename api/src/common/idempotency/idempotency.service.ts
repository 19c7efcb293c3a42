import { Injectable } from '@nestjs/common';
import { IdempotencyRepository, type RequestFingerprint } from './idempotency.repository.js';

/** Pauses between attempts at storing an answer (about 3.5 s in all). */
const COMPLETE_RETRY_MS = [250, 1000, 2250];

export type Claim =
  | { kind: 'claimed' }
  | { kind: 'replay'; statusCode: number; body: unknown }
  | { kind: 'mismatch' }
  | { kind: 'in-progress' };

/**
 * The Idempotency-Key protocol. The first request with a key claims it (a row without a
 * response), runs, and stores its response; a retry with the same key and the same request gets
 * that response back. A refused request (4xx) gives its key back. See idempotency.interceptor.ts.
 */
@Injectable()
export class IdempotencyService {
  constructor(private readonly keys: IdempotencyRepository) {}

  async claim(accountId: string, key: string, request: RequestFingerprint): Promise<Claim> {
    await this.keys.deleteIfExpired(accountId, key);
    // A second pass covers a claim released between our insert and our read.
    for (let attempt = 0; attempt < 2; attempt += 1) {
      if (await this.keys.insert(accountId, key, request)) return { kind: 'claimed' };
      const row = await this.keys.find(accountId, key);
      if (!row) continue;
      const same =
        row.method === request.method && row.path === request.path && row.requestHash === request.requestHash;
      if (!same) return { kind: 'mismatch' };
      if (row.completedAt !== null && row.statusCode !== null) {
        return { kind: 'replay', statusCode: row.statusCode, body: row.responseBody };
      }
      if (await this.keys.reclaimAbandoned(accountId, key, request)) return { kind: 'claimed' };
      return { kind: 'in-progress' };
    }
    return { kind: 'in-progress' };
  }

  /**
   * Stores the answer of a write that succeeded, trying again for a few seconds: a database that
   * blinks now would otherwise leave a written request without a stored answer, and a retry two
   * minutes later would write it again.
   */
  async complete(accountId: string, key: string, statusCode: number, body: unknown): Promise<void> {
    // Stored as the text the client received; see the json column's comment in sql/.
    const json = JSON.stringify(body ?? null);
    for (let attempt = 0; ; attempt += 1) {
      try {
        await this.keys.complete(accountId, key, statusCode, json);
        return;
      } catch (error) {
        if (attempt >= COMPLETE_RETRY_MS.length) throw error;
        await new Promise((resolve) => setTimeout(resolve, COMPLETE_RETRY_MS[attempt]));
      }
    }
  }

  release(accountId: string, key: string): Promise<void> {
    return this.keys.release(accountId, key);
  }
}
