import { dictionary } from '@zxcvbn-ts/language-common';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@peakwise/shared';

// zxcvbn-ts's list of ~49,000 passwords most often seen in breaches. OWASP ASVS 5.0 6.2.4 asks
// that new passwords be checked against at least the top 3,000.
const COMMON = new Set(dictionary['passwords-common'].map((p) => p.toLowerCase()));

/**
 * Why a new password is refused, or null when it is acceptable. Length only, no composition
 * rules (ASVS 6.2.1, 6.2.5, 6.2.9); common passwords and the person's own e-mail or name refused.
 */
export function passwordProblem(password: string, personal: string[] = []): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  const lowered = password.toLowerCase();
  if (COMMON.has(lowered)) return 'This password is too common; it is on lists that attackers try first.';
  const own = personal.map((p) => p.trim().toLowerCase()).filter((p) => p.length >= 3);
  if (own.some((p) => lowered === p || lowered === p.split('@')[0])) {
    return 'Do not use your e-mail or name as a password.';
  }
  return null;
}
