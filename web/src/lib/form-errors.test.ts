import type { ErrorResponse } from '@peakwise/shared';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { applyMappedServerErrors, mapServerErrors } from './form-errors';

const fields = ['email', 'displayName', 'password'] as const;

function apiError(body: Partial<ErrorResponse>): ApiError {
  return new ApiError({ statusCode: 400, error: 'Bad Request', message: 'Invalid request.', ...body });
}

describe('mapServerErrors', () => {
  it('puts a 409 duplicate e-mail under the e-mail field, with no extra alert', () => {
    const error = apiError({
      statusCode: 409,
      error: 'Conflict',
      message: 'An account with this e-mail already exists.',
      details: [{ field: 'email', message: 'An account with this e-mail already exists.' }],
    });
    expect(mapServerErrors(error, fields)).toEqual({
      fieldErrors: [{ field: 'email', message: 'An account with this e-mail already exists.' }],
      formMessage: null,
    });
  });

  it('keeps only the first message for a field', () => {
    const error = apiError({
      details: [
        { field: 'password', message: 'Use at least 8 characters.' },
        { field: 'password', message: 'This password is too common.' },
      ],
    });
    expect(mapServerErrors(error, fields).fieldErrors).toEqual([
      { field: 'password', message: 'Use at least 8 characters.' },
    ]);
  });

  it('shows the server message when there are no details (401 on sign-in)', () => {
    const error = apiError({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is incorrect.',
    });
    expect(mapServerErrors(error, fields)).toEqual({
      fieldErrors: [],
      formMessage: 'E-mail or password is incorrect.',
    });
  });

  it('does not lose details about fields the form does not show', () => {
    const error = apiError({
      details: [
        { field: 'email', message: 'Enter a valid e-mail address.' },
        { field: 'timeZone', message: 'Unknown time zone.' },
      ],
    });
    expect(mapServerErrors(error, fields)).toEqual({
      fieldErrors: [{ field: 'email', message: 'Enter a valid e-mail address.' }],
      formMessage: 'Unknown time zone.',
    });
  });

  it('gives a generic message for errors that are not from the API', () => {
    expect(mapServerErrors(new TypeError('boom'), fields)).toEqual({
      fieldErrors: [],
      formMessage: 'Something went wrong. Please try again.',
    });
  });
});

describe('applyMappedServerErrors', () => {
  it("puts each API field's message on the form field it maps to, focusing the first, and the rest above", () => {
    const setError = vi.fn();
    const error = apiError({
      details: [
        { field: 'temperatureC', message: 'Enter a temperature from -10 to 50 °C.' },
        { field: 'fedAt', message: 'Enter a time that is not in the future.' },
        { field: 'culture', message: 'This culture is archived.' },
      ],
    });
    applyMappedServerErrors<{ temperature: string; fedAt: string }>(error, setError, {
      temperatureC: 'temperature',
      fedAt: 'fedAt',
    });
    expect(setError.mock.calls).toEqual([
      ['temperature', { type: 'server', message: 'Enter a temperature from -10 to 50 °C.' }, { shouldFocus: true }],
      ['fedAt', { type: 'server', message: 'Enter a time that is not in the future.' }, { shouldFocus: false }],
      ['root.server', { type: 'server', message: 'This culture is archived.' }],
    ]);
  });
});
