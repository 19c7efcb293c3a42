import { describe, expect, it } from 'vitest';
import { statusChangedMessage } from './status';

describe('statusChangedMessage', () => {
  it('says that disabling signs the account out, and that enabling lets it sign in', () => {
    expect(statusChangedMessage('Dev Rowan', true)).toBe('Dev Rowan is disabled and has been signed out everywhere.');
    expect(statusChangedMessage('Dev Rowan', false)).toBe('Dev Rowan can sign in again.');
  });
});
