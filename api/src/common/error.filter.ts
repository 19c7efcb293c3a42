import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  Catch,
  HttpException,
  HttpStatus,
  NotFoundException,
  type ArgumentsHost,
  type ExceptionFilter,
} from '@nestjs/common';
import type { ErrorResponse, FieldError } from '@peakwise/shared';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { STATUS_CODES } from 'node:http';
import type { Logger } from 'pino';
import { DATABASE_RETRY_AFTER_SECONDS, isDatabaseUnavailable } from '../db/unavailable.js';
import { TooManyAttemptsException } from './too-many-attempts.exception.js';

interface ErrorBody {
  message?: unknown;
  details?: FieldError[];
}

/** Errors that Fastify raises itself (bad JSON, wrong content type, body too large) carry these. */
interface FastifyError {
  statusCode?: number;
  code?: string;
  message: string;
}

// Fastify's own wording names its internals ("content-type is set to…"); say it plainly.
const PLAIN_MESSAGES: Record<string, string> = {
  FST_ERR_CTP_INVALID_MEDIA_TYPE: 'Send the request body as application/json.',
  FST_ERR_CTP_INVALID_JSON_BODY: 'The request body is not valid JSON.',
  FST_ERR_CTP_EMPTY_JSON_BODY: 'The request body is empty; send a JSON object.',
  FST_ERR_CTP_BODY_TOO_LARGE: 'The request body is too large.',
  FST_ERR_BAD_URL: 'The address is not a valid URL.',
  FST_ERR_MAX_PARAM_LENGTH: 'A part of the address is too long.',
};

function plainMessage(error: unknown): string | undefined {
  const code = (error as FastifyError | undefined)?.code;
  if (code) return PLAIN_MESSAGES[code];
  // A custom parser may throw JSON.parse's own SyntaxError.
  return error instanceof SyntaxError ? PLAIN_MESSAGES.FST_ERR_CTP_INVALID_JSON_BODY : undefined;
}

function reason(statusCode: number): string {
  return STATUS_CODES[statusCode] ?? 'Error';
}

export function toErrorResponse(exception: unknown): ErrorResponse {
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    const body = exception.getResponse();
    const { message, details } = (typeof body === 'object' ? body : { message: body }) as ErrorBody;
    // Nest's Fastify adapter wraps Fastify's 4xx errors (bad JSON, wrong content type) in an
    // HttpException and keeps the original as its cause.
    const plain = plainMessage(exception.cause);
    return {
      statusCode,
      error: reason(statusCode),
      message: plain ?? (typeof message === 'string' ? message : exception.message),
      ...(details?.length ? { details } : {}),
    };
  }
  if (isDatabaseUnavailable(exception)) {
    return {
      statusCode: HttpStatus.SERVICE_UNAVAILABLE,
      error: reason(HttpStatus.SERVICE_UNAVAILABLE),
      message: 'The logbook’s database cannot be reached just now. Nothing was lost; try again in a moment.',
    };
  }
  const status = (exception as FastifyError | undefined)?.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    return {
      statusCode: status,
      error: reason(status),
      message: plainMessage(exception) ?? (exception as FastifyError).message,
    };
  }
  return {
    statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
    error: 'Internal Server Error',
    message: 'Something went wrong on our side. Please try again.',
  };
}

/**
 * Fastify's router refuses a malformed or overlong path before Nest sees the request, so its
 * answers would skip the filter below; this gives them the one error shape too (createAdapter).
 */
export function frameworkError(error: unknown, _request: FastifyRequest, reply: FastifyReply): void {
  const body = toErrorResponse(error);
  if (body.statusCode === 503) void reply.header('retry-after', String(DATABASE_RETRY_AFTER_SECONDS));
  void reply.status(body.statusCode).type('application/json; charset=utf-8').send(body);
}

/**
 * The one place errors become responses: every error, ours or the framework's, leaves as an
 * ErrorResponse. Unknown paths outside /api get the web app's index.html so client-side routes
 * survive a reload.
 */
@Catch()
export class ErrorFilter implements ExceptionFilter {
  private readonly indexHtml: string | null;

  constructor(
    private readonly logger: Logger,
    webDist: string | null,
  ) {
    this.indexHtml = webDist ? readFileSync(join(webDist, 'index.html'), 'utf8') : null;
  }

  catch(exception: unknown, host: ArgumentsHost): void {
    const reply = host.switchToHttp().getResponse<FastifyReply>();
    const request = host.switchToHttp().getRequest<FastifyRequest>();
    if (exception instanceof NotFoundException && this.indexHtml && this.isPageRequest(request)) {
      void reply.status(200).type('text/html; charset=utf-8').header('cache-control', 'no-cache').send(this.indexHtml);
      return;
    }
    const body = toErrorResponse(exception);
    if (exception instanceof TooManyAttemptsException) {
      void reply.header('retry-after', String(exception.retryAfterSeconds));
    }
    if (body.statusCode === 503 && isDatabaseUnavailable(exception)) {
      void reply.header('retry-after', String(DATABASE_RETRY_AFTER_SECONDS));
    }
    if (body.statusCode >= 500) {
      this.logger.error({ err: exception, reqId: request.id }, 'unhandled error');
    }
    void reply.status(body.statusCode).type('application/json; charset=utf-8').send(body);
  }

  private isPageRequest(request: FastifyRequest): boolean {
    const path = request.url.split('?')[0] ?? '';
    return request.method === 'GET' && path !== '/api' && !path.startsWith('/api/');
  }
}
