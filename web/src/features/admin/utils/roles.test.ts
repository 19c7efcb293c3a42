import { describe, expect, it } from 'vitest';
import { roleChangedMessage } from './roles';

describe('roleChangedMessage', () => {
  it('reads as a sentence for each role', () => {
    expect(roleChangedMessage('Amara Quist', 'instructor')).toBe('Amara Quist is now an instructor.');
    expect(roleChangedMessage('Dev Rowan', 'baker')).toBe('Dev Rowan is now a baker.');
    expect(roleChangedMessage('Ines Marlow', 'admin')).toBe('Ines Marlow is now an admin.');
  });
});
