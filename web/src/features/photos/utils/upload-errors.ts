import { PHOTOS_MAX_PER_REQUEST } from '@peakwise/shared';
import { MAX_SIZE_WORDS } from './photo-checks';

/**
 * The words shown under a file the server turned down. The server's own message wins when it sent
 * one (it knows what it found in the bytes); these stand in when the answer had no usable body,
 * e.g. a proxy's bare 413.
 */
export function uploadErrorMessage(status: number, serverMessage: string | null): string {
  if (serverMessage) return serverMessage;
  switch (status) {
    case 0:
      return 'Peakwise could not be reached. Check your connection and try again.';
    case 413:
      return `Too large: each photo may be at most ${MAX_SIZE_WORDS}, ${PHOTOS_MAX_PER_REQUEST} at a time.`;
    case 415:
      return 'Not a photo Peakwise takes: only JPEG, PNG or WebP.';
    case 422:
      return 'This image could not be read (damaged, or too many pixels).';
    case 404:
      return 'This log is no longer there. Reload the page.';
    case 401:
      return 'Your session ended. Sign in again, then add the photo.';
    default:
      return 'Something went wrong on our side. Please try again in a moment.';
  }
}

/** Whether sending the same file again could help (the network or the server, not the file). */
export function worthRetrying(status: number): boolean {
  return status === 0 || status >= 500;
}
