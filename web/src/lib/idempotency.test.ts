import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { retriesSameWrite } from './idempotency';

const answered = (statusCode: number) => new ApiError({ statusCode, error: 'x', message: 'x' });

describe('retriesSameWrite', () => {
  it('keeps the key when there was no answer or the first attempt is still running (409)', () => {
    expect(retriesSameWrite(answered(0))).toBe(true);
    expect(retriesSameWrite(answered(409))).toBe(true);
  });

  it('takes a new key after a success or any other answer', () => {
    expect(retriesSameWrite(undefined)).toBe(false);
    for (const status of [400, 404, 422, 500, 503])
      expect(retriesSameWrite(answered(status)), String(status)).toBe(false);
    expect(retriesSameWrite(new Error('not from the API'))).toBe(false);
  });
});
