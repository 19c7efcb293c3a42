import type { CommentView } from '@peakwise/shared';

/** The chip beside an author's name: who this is to the reader, or nothing. */
export function roleChip(comment: Pick<CommentView, 'mine' | 'author'>): 'You' | 'Instructor' | 'Student' {
  if (comment.mine) return 'You';
  return comment.author.role === 'instructor' ? 'Instructor' : 'Student';
}

/**
 * Whether the owner's own page shows the thread: when someone may write in it (the baker is a
 * student in a class) or when it already has comments (e.g. from a class since left). A solo
 * baker never sees an empty comment box.
 */
export function showOwnerThread(isStudent: boolean | undefined, commentCount: number | undefined): boolean {
  return (commentCount ?? 0) > 0 || isStudent === true;
}
