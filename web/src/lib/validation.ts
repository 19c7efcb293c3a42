import { DISPLAY_NAME_MAX_LENGTH, EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@peakwise/shared';

// Client-side checks mirror the shared limits so people hear about a typo before a round trip.
// The server stays the authority (e.g. it alone rejects common passwords).

export const emailRules = {
  required: 'Enter your e-mail address.',
  maxLength: { value: EMAIL_MAX_LENGTH, message: `Use at most ${EMAIL_MAX_LENGTH} characters.` },
  pattern: { value: /^[^\s@]+@[^\s@]+\.[^\s@]+$/, message: 'Enter an e-mail address like name@example.com.' },
};

export const displayNameRules = {
  required: 'Enter the name Peakwise should call you.',
  pattern: { value: /\S/, message: 'Enter the name Peakwise should call you.' },
  maxLength: {
    value: DISPLAY_NAME_MAX_LENGTH,
    message: `Use at most ${DISPLAY_NAME_MAX_LENGTH} characters.`,
  },
};

export const newPasswordRules = {
  required: 'Choose a password.',
  minLength: {
    value: PASSWORD_MIN_LENGTH,
    message: `Use at least ${PASSWORD_MIN_LENGTH} characters.`,
  },
  maxLength: {
    value: PASSWORD_MAX_LENGTH,
    message: `Use at most ${PASSWORD_MAX_LENGTH} characters.`,
  },
};

export const newPasswordHint = `At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one.`;
