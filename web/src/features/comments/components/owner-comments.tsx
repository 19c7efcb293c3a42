import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useIsClassStudent } from '../api/get-class-memberships';
import { useQuery } from '@tanstack/react-query';
import { commentsQueryOptions } from '../api/get-comments';
import type { CommentSubject } from '../api/query-keys';
import { showOwnerThread } from '../utils/comment-words';
import { CommentThread } from './comment-thread';

/**
 * The thread under the baker's own feeding or bake, only when it can matter: the baker is in a
 * class, or comments are already there. The list query is shared with the thread (same key).
 */
export function OwnerComments({ subject }: { subject: CommentSubject }) {
  const account = useSignedInAccount();
  const isStudent = useIsClassStudent();
  // Only the thread itself polls; a solo baker's page asks once.
  const comments = useQuery({ ...commentsQueryOptions(subject), refetchInterval: false });
  if (!showOwnerThread(isStudent, comments.data?.total)) return null;
  const what = subject.type === 'feeding' ? 'feeding' : 'bake';
  return (
    <CommentThread
      subject={subject}
      timeZone={account.timeZone}
      heading="Comments from your class"
      emptyText={`No comments yet. Your instructor can see this ${what} and may leave a note here; you can ask a question too.`}
      formLabel="Reply or ask your instructor"
    />
  );
}
