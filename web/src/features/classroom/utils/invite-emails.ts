import { CLASS_INVITES_MAX_PER_REQUEST } from '@peakwise/shared';

// A light check only, to catch a stray word before sending; the API has the last say.
const LOOKS_LIKE_EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export interface ParsedEmails {
  emails: string[];
  invalid: string[];
}

/**
 * Addresses pasted one per line, or separated by commas, semicolons or spaces (as a mail program
 * copies them). Duplicates are dropped without regard to case; "Name <a@b.c>" keeps the address.
 */
export function parseEmails(text: string): ParsedEmails {
  const seen = new Set<string>();
  const emails: string[] = [];
  const invalid: string[] = [];
  const angled = text.replace(/[^,;\n<>]*<([^>]+)>/g, ' $1 ');
  for (const part of angled.split(/[\s,;]+/)) {
    const address = part.trim();
    if (!address) continue;
    if (!LOOKS_LIKE_EMAIL.test(address)) {
      invalid.push(address);
      continue;
    }
    const key = address.toLowerCase();
    if (seen.has(key)) continue;
    seen.add(key);
    emails.push(address);
  }
  return { emails, invalid };
}

/** The form's own complaint about the text, or true when it may be sent. */
export function validateEmails(text: string): string | true {
  const { emails, invalid } = parseEmails(text);
  if (invalid.length > 0) return `Not an e-mail address: ${invalid.slice(0, 3).join(', ')}`;
  if (emails.length === 0) return 'Enter at least one e-mail address.';
  if (emails.length > CLASS_INVITES_MAX_PER_REQUEST) {
    return `At most ${CLASS_INVITES_MAX_PER_REQUEST} addresses at a time (${emails.length} entered).`;
  }
  return true;
}
