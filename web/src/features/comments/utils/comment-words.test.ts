import { describe, expect, it } from 'vitest';
import { roleChip, showOwnerThread } from './comment-words';

const author = (role: 'owner' | 'instructor') => ({ id: 'a', displayName: 'Ines Marlow', role });

describe('roleChip', () => {
  it('marks the reader’s own comments "You", whatever their role', () => {
    expect(roleChip({ mine: true, author: author('instructor') })).toBe('You');
    expect(roleChip({ mine: true, author: author('owner') })).toBe('You');
  });

  it('names the other side by role', () => {
    expect(roleChip({ mine: false, author: author('instructor') })).toBe('Instructor');
    expect(roleChip({ mine: false, author: author('owner') })).toBe('Student');
  });
});

describe('showOwnerThread', () => {
  it('hides the thread from a solo baker with no comments', () => {
    expect(showOwnerThread(false, 0)).toBe(false);
    expect(showOwnerThread(undefined, undefined)).toBe(false);
  });

  it('shows it to a student, even before anyone has written', () => {
    expect(showOwnerThread(true, 0)).toBe(true);
  });

  it('keeps showing comments after the baker left the class', () => {
    expect(showOwnerThread(false, 2)).toBe(true);
  });
});
