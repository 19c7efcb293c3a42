import { randomInt } from 'node:crypto';
import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from '@peakwise/shared';

/** The stored form (sql/0010 checks the same): upper case, no look-alikes. */
export const JOIN_CODE_PATTERN = new RegExp(`^[${JOIN_CODE_ALPHABET}]{${JOIN_CODE_LENGTH}}$`);

/** 32^8 ≈ 10^12 codes, drawn with a CSPRNG, so a code cannot be guessed from another. */
export function newJoinCode(): string {
  let code = '';
  for (let i = 0; i < JOIN_CODE_LENGTH; i++) code += JOIN_CODE_ALPHABET[randomInt(JOIN_CODE_ALPHABET.length)];
  return code;
}

/** People read codes aloud and type them: case, spaces and dashes do not matter. */
export function normaliseJoinCode(value: string): string {
  return value.replace(/[\s-]/g, '').toUpperCase();
}
