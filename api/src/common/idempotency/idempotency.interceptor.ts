import { createHash } from 'node:crypto';
import {
  BadRequestException,
  ConflictException,
  HttpException,
  Injectable,
  SetMetadata,
  UnprocessableEntityException,
  UseInterceptors,
  applyDecorators,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ApiBadRequestResponse, ApiConflictResponse, ApiHeader, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import {
  IDEMPOTENCY_KEY_HEADER,
  IDEMPOTENCY_KEY_MAX_LENGTH,
  IDEMPOTENCY_KEY_TTL_DAYS,
  IDEMPOTENT_REPLAYED_HEADER,
} from '@peakwise/shared';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { concatMap, from, of, throwError, catchError, type Observable } from 'rxjs';
import type { AccountRecord } from '../../account/account.repository.js';
import { requestHash } from './canonical-json.js';
import { parseIdempotencyKey } from './idempotency-key.js';
import { IdempotencyService } from './idempotency.service.js';

const REQUIRED = 'peakwise:idempotency-key-required';

/** Where the refusals point (the draft's examples use a `Link: <…>; rel="describedby"`). */
const DESCRIBED_BY = '</api/docs>; rel="describedby"; type="text/html"';

const FORMAT = `one key of 1 to ${IDEMPOTENCY_KEY_MAX_LENGTH} visible ASCII characters, e.g. a UUID`;

type KeyedRequest = FastifyRequest & { account?: AccountRecord; files?: unknown };

/**
 * Makes a write safe to retry, after draft-ietf-httpapi-idempotency-key-header (sections 2.6
 * "Idempotency Enforcement Scenarios" and 2.7 "Error Scenarios", verified in the working group's
 * editor's copy; the 2025 revisions keep the statuses):
 * - first request with a key: runs, and its response is stored;
 * - same key, same method, path and body: the stored status and body, with
 *   Idempotent-Replayed: true, and nothing runs;
 * - same key, another body or route: 422; the first request still running: 409;
 * - no key on a route that requires one: 400; a malformed key: 400 (both name the header).
 *
 * Keys are per account (runs after the session guard) and kept IDEMPOTENCY_KEY_TTL_DAYS.
 *
 * Where we differ from the draft: a request refused with a 4xx gives its key back instead of
 * storing the error, so a corrected retry may use the same key. A 4xx writes nothing (refused
 * before or inside the write's transaction), so running again is what a replay of the error would
 * have told the client to do. A 5xx keeps the claim (see below).
 *
 * Limit: the write and the stored response are separate transactions. If the process (or the
 * database) dies between the two, or the write committed and something after it failed (a 5xx),
 * the claim is left without a response: retries get 409 for two minutes, then the claim counts as
 * abandoned and a retry runs again — a second write if the first had committed. Closing this
 * needs the claim, the write and the response in one transaction (see the report of this change).
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  constructor(
    private readonly idempotency: IdempotencyService,
    private readonly reflector: Reflector,
  ) {}

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    const request = http.getRequest<KeyedRequest>();
    const reply = http.getResponse<FastifyReply>();
    const header = request.headers[IDEMPOTENCY_KEY_HEADER.toLowerCase()];
    if (header === undefined) {
      if (!this.reflector.get<boolean>(REQUIRED, context.getHandler())) return next.handle();
      void reply.header('link', DESCRIBED_BY);
      throw refusal(
        `This write needs an ${IDEMPOTENCY_KEY_HEADER} header, so that a retry cannot store it twice.`,
        `Send ${FORMAT}, made once per write and sent again unchanged on a retry.`,
      );
    }
    const key = typeof header === 'string' ? parseIdempotencyKey(header) : null;
    if (key === null) {
      void reply.header('link', DESCRIBED_BY);
      throw refusal(`The ${IDEMPOTENCY_KEY_HEADER} header is not a key we can use.`, `Send ${FORMAT}.`);
    }
    const account = request.account;
    if (!account) throw new Error('Idempotent() used on a route without the session guard');

    const claim = await this.idempotency.claim(account.id, key, {
      method: request.method,
      path: request.url.split('?')[0] ?? request.url,
      requestHash: fingerprint(request),
    });
    switch (claim.kind) {
      case 'replay':
        void reply.header(IDEMPOTENT_REPLAYED_HEADER, 'true').status(claim.statusCode);
        return of(claim.body);
      case 'mismatch':
        void reply.header('link', DESCRIBED_BY);
        throw new UnprocessableEntityException({
          message: `This ${IDEMPOTENCY_KEY_HEADER} was already used for a different request. Use a new key for a new request.`,
          details: [{ field: IDEMPOTENCY_KEY_HEADER, message: 'Already used for a different request.' }],
        });
      case 'in-progress':
        void reply.header('link', DESCRIBED_BY).header('retry-after', '1');
        throw new ConflictException({
          message: `A request with this ${IDEMPOTENCY_KEY_HEADER} is still running. Retry in a moment with the same key.`,
          details: [{ field: IDEMPOTENCY_KEY_HEADER, message: 'The first request with this key has not finished.' }],
        });
      case 'claimed':
        return next.handle().pipe(
          catchError((error: unknown) => {
            // A 4xx is refused before (or inside) the write's transaction: nothing was written, so
            // the key is free for a corrected retry. After a 5xx we cannot know whether the write
            // committed (it may have failed after), so the claim stays: retries get 409 until it
            // counts as abandoned, rather than writing a second time at once.
            if (!isClientError(error)) return throwError(() => error);
            return from(this.idempotency.release(account.id, key)).pipe(concatMap(() => throwError(() => error)));
          }),
          // The write succeeded: whatever happens while storing its answer, the key is not released.
          concatMap(async (body: unknown) => {
            await this.idempotency.complete(account.id, key, reply.statusCode, body);
            return body;
          }),
        );
    }
  }
}

function isClientError(error: unknown): boolean {
  return error instanceof HttpException && error.getStatus() < 500;
}

function refusal(message: string, detail: string): BadRequestException {
  return new BadRequestException({ message, details: [{ field: IDEMPOTENCY_KEY_HEADER, message: detail }] });
}

/**
 * The body's canonical hash; an upload (multipart, parsed by FilesInterceptor before this runs)
 * adds each file's field, name, type and bytes, so another photo under the same key is a 422.
 */
function fingerprint(request: KeyedRequest): string {
  const files = Array.isArray(request.files) ? (request.files as UploadedFileLike[]) : [];
  if (!files.length) return requestHash(request.body);
  return requestHash({
    body: request.body ?? null,
    files: files.map((f) => ({
      field: f.fieldname ?? null,
      name: f.originalname ?? null,
      type: f.mimetype ?? null,
      sha256: f.buffer ? createHash('sha256').update(f.buffer).digest('hex') : null,
    })),
  });
}

interface UploadedFileLike {
  fieldname?: string;
  originalname?: string;
  mimetype?: string;
  buffer?: Buffer;
}

export interface IdempotentOptions {
  /**
   * Refuse the write without a key (400). For the logbook writes an offline outbox replays, where
   * a write stored twice is a wrong log, not a nuisance.
   */
  required?: boolean;
}

/** Accepts (or, with `required`, demands) an Idempotency-Key on this write, and documents it. */
export const Idempotent = (options: IdempotentOptions = {}) => {
  const required = options.required ?? false;
  return applyDecorators(
    SetMetadata(REQUIRED, required),
    UseInterceptors(IdempotencyInterceptor),
    ApiHeader({
      name: IDEMPOTENCY_KEY_HEADER,
      required,
      description:
        `${required ? 'Required. ' : ''}A fresh key per intended write: ${FORMAT}, as an RFC 8941 string ` +
        `("…") or bare. Retrying with the same key and body returns the first response with ` +
        `${IDEMPOTENT_REPLAYED_HEADER}: true and writes nothing; keys are per account and kept ` +
        `${IDEMPOTENCY_KEY_TTL_DAYS} days.`,
    }),
    ApiBadRequestResponse({
      description: required
        ? `${IDEMPOTENCY_KEY_HEADER} missing or malformed (details name the header), or a field needs another look`
        : `${IDEMPOTENCY_KEY_HEADER} malformed (details name the header), or a field needs another look`,
    }),
    ApiUnprocessableEntityResponse({ description: 'The key was already used for a different request' }),
    ApiConflictResponse({ description: 'A request with this key is still running' }),
  );
};
