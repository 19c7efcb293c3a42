import { HttpException, HttpStatus } from '@nestjs/common';

/** A 429 that knows when to come back: the error filter sends `retryAfterSeconds` as Retry-After. */
export class TooManyAttemptsException extends HttpException {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super({ message }, HttpStatus.TOO_MANY_REQUESTS);
  }
}
