import {
  ConflictException,
  Injectable,
  UnprocessableEntityException,
  UseInterceptors,
  applyDecorators,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import { ApiConflictResponse, ApiHeader, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import {
  IDEMPOTENCY_KEY_HEADER,
  IDEMPOTENCY_KEY_MAX_LENGTH,
  IDEMPOTENCY_KEY_TTL_HOURS,
  IDEMPOTENT_REPLAYED_HEADER,
} from '@peakwise/shared';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { concatMap, from, of, throwError, catchError, type Observable } from 'rxjs';
import type { AccountRecord } from '../../account/account.repository.js';
import { fieldError } from '../validation.js';
import { requestHash } from './canonical-json.js';
import { IdempotencyService } from './idempotency.service.js';

// Visible ASCII, so a key survives any proxy and logs readably; a UUID is the usual choice.
const KEY = new RegExp(`^[\\x21-\\x7e]{1,${IDEMPOTENCY_KEY_MAX_LENGTH}}$`);

/**
 * Makes a write safe to retry: with an Idempotency-Key header, the first request runs and its
 * response is stored; the same request again with the same key answers with that response (and
 * Idempotent-Replayed: true) without running again. Without the header the route runs as usual.
 *
 * Runs after the session guard (it needs the account: keys are per account) and before the
 * validation pipe, so a refused request releases its key like any other failure.
 *
 * Limit: the write and the stored response are separate statements. If the process dies between
 * the two, the claim is abandoned and a retry more than two minutes later runs again.
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  constructor(private readonly idempotency: IdempotencyService) {}

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    const request = http.getRequest<FastifyRequest & { account?: AccountRecord }>();
    const reply = http.getResponse<FastifyReply>();
    const header = request.headers[IDEMPOTENCY_KEY_HEADER.toLowerCase()];
    if (header === undefined) return next.handle();
    if (typeof header !== 'string' || !KEY.test(header)) {
      throw fieldError(
        IDEMPOTENCY_KEY_HEADER,
        `Send one key of 1 to ${IDEMPOTENCY_KEY_MAX_LENGTH} visible ASCII characters, e.g. a UUID.`,
      );
    }
    const account = request.account;
    if (!account) throw new Error('Idempotent() used on a route without the session guard');

    const key = header;
    const claim = await this.idempotency.claim(account.id, key, {
      method: request.method,
      path: request.url.split('?')[0] ?? request.url,
      requestHash: requestHash(request.body),
    });
    switch (claim.kind) {
      case 'replay':
        void reply.header(IDEMPOTENT_REPLAYED_HEADER, 'true').status(claim.statusCode);
        return of(claim.body);
      case 'mismatch':
        throw new UnprocessableEntityException({
          message: 'This Idempotency-Key was already used for a different request. Use a new key for a new request.',
          details: [{ field: IDEMPOTENCY_KEY_HEADER, message: 'Already used for a different request.' }],
        });
      case 'in-progress':
        throw new ConflictException('A request with this Idempotency-Key is still running. Retry in a moment.');
      case 'claimed':
        return next.handle().pipe(
          concatMap(async (body: unknown) => {
            await this.idempotency.complete(account.id, key, reply.statusCode, body);
            return body;
          }),
          catchError((error: unknown) =>
            from(this.idempotency.release(account.id, key)).pipe(concatMap(() => throwError(() => error))),
          ),
        );
    }
  }
}

/** Accepts an Idempotency-Key on this write (and documents it). */
export const Idempotent = () =>
  applyDecorators(
    UseInterceptors(IdempotencyInterceptor),
    ApiHeader({
      name: IDEMPOTENCY_KEY_HEADER,
      required: false,
      description:
        `A fresh key per intended write (e.g. a UUID). Retrying with the same key and body returns the first ` +
        `response with ${IDEMPOTENT_REPLAYED_HEADER}: true and writes nothing; keys expire after ` +
        `${IDEMPOTENCY_KEY_TTL_HOURS} hours.`,
    }),
    ApiUnprocessableEntityResponse({ description: 'The key was already used for a different request' }),
    ApiConflictResponse({ description: 'A request with this key is still running' }),
  );
