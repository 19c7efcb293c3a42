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

const PLAIN_MESSAGES: Record<string, string> = {
  FST_ERR_CTP_INVALID_MEDIA_TYPE: 'Send the request body as application/json.',
  FST_ERR_CTP_EMPTY_JSON_BODY: 'The request body is empty; send a JSON object.',
  FST_ERR_CTP_BODY_TOO_LARGE: 'The request body is too large.',
};

export function toErrorResponse(exception: unknown): ErrorResponse {
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    const body = exception.getResponse();
    const { message, details } = (typeof body === 'object' ? body : { message: body }) as ErrorBody;
    return {
      statusCode,
      error: STATUS_CODES[statusCode] ?? 'Error',
      message: typeof message === 'string' ? message : exception.message,
      ...(details?.length ? { details } : {}),
    };
  }
  const fastifyError = exception as FastifyError;
  const status = fastifyError?.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const invalidJson = fastifyError.code === 'FST_ERR_CTP_INVALID_JSON' || exception instanceof SyntaxError;
    return {
      statusCode: status,
      error: STATUS_CODES[status] ?? 'Error',
      message: invalidJson
        ? 'The request body is not valid JSON.'
        : (PLAIN_MESSAGES[fastifyError.code ?? ''] ?? fastifyError.message),
    };
  }
  return {
    statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
    error: 'Internal Server Error',
    message: 'Something went wrong on our side. Please try again.',
  };
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
