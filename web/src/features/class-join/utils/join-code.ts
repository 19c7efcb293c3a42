import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from '@peakwise/shared';

/** "wxyz-2345", "WXYZ 2345" → "WXYZ2345": codes are read aloud and copied from slides. */
export function normalizeJoinCode(input: string): string {
  return input.toUpperCase().replace(/[\s\-–—_.]/g, '');
}

/** What is wrong with a typed code, in words; null when it is a whole code worth asking about. */
export function joinCodeProblem(input: string): string | null {
  const code = normalizeJoinCode(input);
  if (code.length === 0) return 'Enter the code your instructor gave you.';
  const wrong = [...code].filter((c) => !JOIN_CODE_ALPHABET.includes(c));
  if (wrong.length > 0) {
    const lookAlikes = wrong.some((c) => 'IO01'.includes(c));
    return lookAlikes
      ? 'Codes never use I, O, 0 or 1: it is probably a J, Q, 2 or another look-alike. Check with your instructor.'
      : `A join code has only letters and digits (not “${wrong[0]}”).`;
  }
  if (code.length !== JOIN_CODE_LENGTH)
    return `A join code has ${JOIN_CODE_LENGTH} characters; this has ${code.length}.`;
  return null;
}
