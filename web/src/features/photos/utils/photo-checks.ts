import { PHOTO_ACCEPTED_TYPES, PHOTO_MAX_BYTES, PHOTOS_MAX_PER_REQUEST } from '@peakwise/shared';

/** What the checks need of a picked file (a browser File has all three). */
export interface PickedFile {
  name: string;
  size: number;
  type: string;
}

export interface FileCheck<F extends PickedFile> {
  file: F;
  /** Why it is not sent, in words for the baker; null when it may go. */
  problem: string | null;
}

export interface PickCheck<F extends PickedFile> {
  files: FileCheck<F>[];
  /** About the pick as a whole (too many at once); the files themselves are then not sent. */
  problem: string | null;
}

const ACCEPTED: readonly string[] = PHOTO_ACCEPTED_TYPES;

const MB = 1024 * 1024;

/**
 * "3.4 MB", "820 kB". Binary units (1 MB = 1,048,576 bytes), the same unit as the limit, so a file
 * shown as "15.0 MB" is exactly at it rather than a decimal "15.7 MB" that seems over.
 */
export function formatBytes(bytes: number): string {
  if (bytes >= MB) return `${(bytes / MB).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} kB`;
}

export const MAX_SIZE_WORDS = `${Math.round(PHOTO_MAX_BYTES / MB)} MB`;

/**
 * The contract's limits checked before anything is sent, so a wrong pick is explained at once
 * instead of after a long upload. The server decides the type from the bytes; here the browser's
 * type is a first guess, and an empty one (some Android galleries) is left to the server.
 */
export function checkFile<F extends PickedFile>(file: F): FileCheck<F> {
  if (file.size === 0) return { file, problem: 'This file is empty.' };
  if (file.type !== '' && !ACCEPTED.includes(file.type)) {
    const heic = /hei[cf]/i.test(file.type) || /\.hei[cf]$/i.test(file.name);
    return {
      file,
      problem: heic
        ? 'HEIC photos are not accepted yet: choose JPEG, PNG or WebP (on an iPhone, Camera › Formats › Most Compatible).'
        : 'Not a photo Peakwise takes: only JPEG, PNG or WebP.',
    };
  }
  if (file.size > PHOTO_MAX_BYTES)
    return { file, problem: `Too large (${formatBytes(file.size)}): each photo may be at most ${MAX_SIZE_WORDS}.` };
  return { file, problem: null };
}

export function checkPick<F extends PickedFile>(files: readonly F[]): PickCheck<F> {
  if (files.length > PHOTOS_MAX_PER_REQUEST) {
    return {
      files: [],
      problem: `${files.length} photos picked: add at most ${PHOTOS_MAX_PER_REQUEST} at a time.`,
    };
  }
  return { files: files.map(checkFile), problem: null };
}
