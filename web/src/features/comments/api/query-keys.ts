import type { CommentSubjectType } from '@peakwise/shared';

/** What a thread hangs on: one feeding or one bake plan. */
export interface CommentSubject {
  type: CommentSubjectType;
  id: string;
}

// Posting or deleting refreshes just the one thread; the whole root when the viewer changes.
export const commentKeys = {
  all: ['comments'] as const,
  thread: (subject: CommentSubject) => ['comments', subject.type, subject.id] as const,
};

/** `/feedings/:id/comments` or `/plans/:id/comments`: the API's path for a subject's thread. */
export function threadPath(subject: CommentSubject): string {
  const base = subject.type === 'feeding' ? 'feedings' : 'plans';
  return `/${base}/${encodeURIComponent(subject.id)}/comments`;
}
