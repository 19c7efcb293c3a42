import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import { IDEMPOTENCY_KEY_HEADER } from '@peakwise/shared';
import type { FastifyRequest } from 'fastify';
import { parseIdempotencyKey } from './idempotency-key.js';

/**
 * The request's Idempotency-Key (already checked by the interceptor), for a write that also keys
 * the row it creates. The interceptor's stored response covers every retry but one: the process
 * dying after the row committed and before the response was stored. Then the claim is taken over
 * after a while and the handler runs again; a row keyed with the same key makes that run find
 * the first row instead of inserting a second (scripts/bench/fault.mjs showed the doubles).
 */
export const WriteKey = createParamDecorator((_data: unknown, context: ExecutionContext): string | null => {
  const header = context.switchToHttp().getRequest<FastifyRequest>().headers[IDEMPOTENCY_KEY_HEADER.toLowerCase()];
  return typeof header === 'string' ? parseIdempotencyKey(header) : null;
});
