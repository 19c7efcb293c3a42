import type { ErrorResponse } from '@peakwise/shared';
import { ApiError } from '@/lib/api-client';

/** The name in `Content-Disposition: attachment; filename="…"`, if there is one. */
export function fileNameFrom(disposition: string | null): string | null {
  const match = disposition ? /filename="([^"]+)"/.exec(disposition) : null;
  return match ? match[1]! : null;
}

export interface FetchedFile {
  text: string;
  /** The server's file name, when it sent one. */
  fileName: string | null;
}

/**
 * GETs a file the API serves (CSV, JSON) as text. Not through api-client, which expects JSON
 * answers; failures still become ApiErrors so the screens can show the server's words.
 */
export async function fetchFile(path: string): Promise<FetchedFile> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { credentials: 'same-origin' });
  } catch {
    throw new ApiError({
      statusCode: 0,
      error: 'Network Error',
      message: 'Peakwise could not be reached. Check your connection and try again.',
    });
  }
  const text = await response.text();
  if (!response.ok) {
    let body: Partial<ErrorResponse> = {};
    try {
      body = JSON.parse(text) as Partial<ErrorResponse>;
    } catch {
      // Not our error shape: the generic message below says enough.
    }
    throw new ApiError({
      statusCode: response.status,
      error: body.error ?? response.statusText,
      message: body.message ?? 'The file could not be prepared. Please try again in a moment.',
    });
  }
  return { text, fileName: fileNameFrom(response.headers.get('content-disposition')) };
}

/** Hands text to the browser as a downloaded file (phones put it in their Downloads). */
export function saveFile(text: string, fileName: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Revoked on the next turn: some browsers start reading the blob only after click() returns.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
