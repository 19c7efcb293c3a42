import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  HttpException,
  HttpStatus,
  NotFoundException,
  UnauthorizedException,
} from '@nestjs/common';
import { errorCodes } from 'fastify';
import { describe, expect, it } from 'vitest';
import { toErrorResponse } from './error.filter.js';
import { fieldError } from './validation.js';

const GENERIC_500 = {
  statusCode: 500,
  error: 'Internal Server Error',
  message: 'Something went wrong on our side. Please try again.',
};

describe('toErrorResponse: HttpException', () => {
  it('keeps status, reason phrase and message, with no details key when there are none', () => {
    expect(toErrorResponse(new NotFoundException('No account with this id.'))).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'No account with this id.',
    });
    expect(toErrorResponse(new UnauthorizedException('Please sign in.'))).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'Please sign in.',
    });
    expect(toErrorResponse(new ForbiddenException())).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Forbidden',
    });
  });

  it('passes field details through', () => {
    expect(toErrorResponse(fieldError('email', 'Enter an e-mail address.'))).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields need another look.',
      details: [{ field: 'email', message: 'Enter an e-mail address.' }],
    });
    const conflict = new ConflictException({ message: 'Taken.', details: [{ field: 'email', message: 'In use.' }] });
    expect(toErrorResponse(conflict)).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: 'Taken.',
      details: [{ field: 'email', message: 'In use.' }],
    });
  });

  it('drops an empty details array', () => {
    const res = toErrorResponse(new BadRequestException({ message: 'Nope.', details: [] }));
    expect(res).toEqual({ statusCode: 400, error: 'Bad Request', message: 'Nope.' });
  });

  it('answers a string message for Nest’s array-of-messages form', () => {
    const res = toErrorResponse(new BadRequestException(['email must be an email', 'password too short']));
    expect(res.statusCode).toBe(400);
    expect(typeof res.message).toBe('string');
    expect(Object.keys(res).sort()).toEqual(['error', 'message', 'statusCode']);
  });

  it('uses the reason phrase of a less common status, and of a plain string body', () => {
    expect(toErrorResponse(new HttpException('Slow down.', HttpStatus.TOO_MANY_REQUESTS))).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Slow down.',
    });
  });

  it('never copies other keys of the response body (e.g. a stack) into the answer', () => {
    const res = toErrorResponse(
      new BadRequestException({ message: 'Nope.', stack: 'at x (y.ts:1:1)', sql: 'SELECT 1' }),
    );
    expect(res).toEqual({ statusCode: 400, error: 'Bad Request', message: 'Nope.' });
  });
});

describe('toErrorResponse: Fastify’s own errors', () => {
  it('words an unsupported content type plainly', () => {
    expect(toErrorResponse(new errorCodes.FST_ERR_CTP_INVALID_MEDIA_TYPE())).toEqual({
      statusCode: 415,
      error: 'Unsupported Media Type',
      message: 'Send the request body as application/json.',
    });
  });

  it('words an empty JSON body and a body too large plainly', () => {
    expect(toErrorResponse(new errorCodes.FST_ERR_CTP_EMPTY_JSON_BODY())).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is empty; send a JSON object.',
    });
    expect(toErrorResponse(new errorCodes.FST_ERR_CTP_BODY_TOO_LARGE())).toEqual({
      statusCode: 413,
      error: 'Payload Too Large',
      message: 'The request body is too large.',
    });
  });

  it('words a JSON syntax error carrying a 400 plainly', () => {
    const error = Object.assign(new SyntaxError('Unexpected end of JSON input'), { statusCode: 400 });
    expect(toErrorResponse(error)).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON.',
    });
  });

  it('words Fastify 5’s invalid-JSON error (FST_ERR_CTP_INVALID_JSON_BODY) plainly', () => {
    expect(toErrorResponse(new errorCodes.FST_ERR_CTP_INVALID_JSON_BODY())).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON.',
    });
  });

  // What the filter really receives: Nest's FastifyAdapter.mapException() wraps every 4xx
  // FastifyError as `new HttpException(error.message, error.statusCode, { cause: error })`.
  it('words them plainly also when Nest hands them over wrapped in an HttpException', () => {
    const cause = new errorCodes.FST_ERR_CTP_INVALID_MEDIA_TYPE();
    const wrapped = new HttpException(cause.message, cause.statusCode!, { cause });
    expect(toErrorResponse(wrapped)).toEqual({
      statusCode: 415,
      error: 'Unsupported Media Type',
      message: 'Send the request body as application/json.',
    });
  });

  it('keeps the message of a 4xx Fastify error it has no plain wording for', () => {
    const error = { statusCode: 405, code: 'FST_ERR_SOMETHING', message: 'Method Not Allowed' };
    expect(toErrorResponse(error)).toEqual({
      statusCode: 405,
      error: 'Method Not Allowed',
      message: 'Method Not Allowed',
    });
  });

  it('turns a 5xx Fastify error into the generic 500, hiding its message', () => {
    const error = { statusCode: 503, code: 'FST_ERR_X', message: 'pool exhausted at db.ts:12:3' };
    expect(toErrorResponse(error)).toEqual(GENERIC_500);
  });
});

describe('toErrorResponse: anything else', () => {
  it('answers the generic 500 for an ordinary Error, hiding SQL and stack', () => {
    const error = new Error('relation "account" does not exist: SELECT * FROM account');
    const res = toErrorResponse(error);
    expect(res).toEqual(GENERIC_500);
    expect(JSON.stringify(res)).not.toMatch(/relation|SELECT|at /);
  });

  it('answers the generic 500 for thrown non-errors', () => {
    for (const thrown of [undefined, null, 'boom', 42, { message: 'no status' }]) {
      expect(toErrorResponse(thrown)).toEqual(GENERIC_500);
    }
  });
});
