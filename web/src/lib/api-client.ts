import type { ErrorResponse } from '@peakwise/shared';

/** A failed API call, carrying the server's ErrorResponse (or one we made up when there was none). */
export class ApiError extends Error {
  readonly status: number;
  readonly body: ErrorResponse;

  constructor(body: ErrorResponse) {
    super(body.message);
    this.name = 'ApiError';
    this.status = body.statusCode;
    this.body = body;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

function isErrorResponse(value: unknown): value is ErrorResponse {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as Partial<ErrorResponse>).statusCode === 'number' &&
    typeof (value as Partial<ErrorResponse>).message === 'string'
  );
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/**
 * Calls the Peakwise API on the same origin. The session lives in an HttpOnly cookie, so there is
 * no token to attach; `same-origin` keeps that cookie away from any other host.
 */
export async function apiRequest<T>(
  method: Method,
  path: string,
  body?: unknown,
  extraHeaders?: Record<string, string>,
): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
        ...extraHeaders,
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    // fetch only rejects when the request never got an answer (offline, server down).
    throw new ApiError({
      statusCode: 0,
      error: 'Network Error',
      message: 'Peakwise could not be reached. Check your connection and try again.',
    });
  }

  const data = await readJson(response);
  if (!response.ok) {
    throw new ApiError(
      isErrorResponse(data)
        ? data
        : {
            statusCode: response.status,
            error: response.statusText,
            message: 'Something went wrong on our side. Please try again in a moment.',
          },
    );
  }
  // The contracts in @peakwise/shared are the agreement with the server; we trust them here
  // rather than re-validating every response. 204 answers come back as undefined.
  return data as T;
}

export const api = {
  get: <T>(path: string) => apiRequest<T>('GET', path),
  post: <T>(path: string, body?: unknown, headers?: Record<string, string>) =>
    apiRequest<T>('POST', path, body, headers),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>('PATCH', path, body),
  delete: <T>(path: string) => apiRequest<T>('DELETE', path),
};
