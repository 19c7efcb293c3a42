import type { CommentView } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { useNow } from '@/lib/use-now';
import { useComments } from '../api/get-comments';
import type { CommentSubject } from '../api/query-keys';
import { CommentForm } from './comment-form';
import { CommentItem } from './comment-item';
import { DeleteCommentDialog } from './delete-comment-dialog';

interface Props {
  subject: CommentSubject;
  timeZone: string;
  heading: string;
  /** Said above the box while nobody has written yet. */
  emptyText: string;
  /** The reply box's label. */
  formLabel: string;
  /** An anchor for a "Go to the comments" link on a long page. */
  id?: string;
}

/** A conversation on one feeding or bake: oldest first, polled while open, with a reply box. */
export function CommentThread({ subject, timeZone, heading, emptyText, formLabel, id }: Props) {
  const headingId = useId();
  const comments = useComments(subject);
  const now = useNow();
  const [deleting, setDeleting] = useState<CommentView | null>(null);
  const items = comments.data?.items ?? [];

  return (
    <Card component="section" aria-labelledby={headingId} id={id} sx={{ scrollMarginTop: 72 }}>
      <CardContent>
        <Typography variant="h2" id={headingId} gutterBottom>
          {heading}
        </Typography>
        {comments.isError && <LoadError error={comments.error} onRetry={() => void comments.refetch()} />}
        {comments.data && items.length === 0 && (
          <Typography color="text.secondary" sx={{ mb: 2 }}>
            {emptyText}
          </Typography>
        )}
        {items.length > 0 && (
          <Stack component="ol" aria-label="Comments" spacing={0.5} sx={{ listStyle: 'none', p: 0, m: 0, mb: 2 }}>
            {items.map((c) => (
              <CommentItem key={c.id} comment={c} now={now} timeZone={timeZone} onDelete={setDeleting} />
            ))}
          </Stack>
        )}
        {comments.data && comments.data.total > items.length && (
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
            Showing the first {items.length} of {comments.data.total} comments.
          </Typography>
        )}
        <CommentForm subject={subject} label={formLabel} />
      </CardContent>
      <DeleteCommentDialog subject={subject} comment={deleting} onClose={() => setDeleting(null)} />
    </Card>
  );
}
