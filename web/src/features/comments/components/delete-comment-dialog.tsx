import type { CommentView } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useId } from 'react';
import { FormAlert } from '@/components/form/form-alert';
import { isApiError } from '@/lib/api-client';
import { useDeleteComment } from '../api/delete-comment';
import type { CommentSubject } from '../api/query-keys';

interface Props {
  subject: CommentSubject;
  comment: CommentView | null;
  onClose: () => void;
}

/** "Delete your comment?" — waits for the server and shows its refusal. */
export function DeleteCommentDialog({ subject, comment, onClose }: Props) {
  const titleId = useId();
  const remove = useDeleteComment(subject);
  const close = () => {
    if (remove.isPending) return;
    remove.reset();
    onClose();
  };
  const excerpt = comment && comment.body.length > 80 ? `${comment.body.slice(0, 80)}…` : comment?.body;

  return (
    <Dialog open={comment !== null} onClose={close} fullWidth maxWidth="xs" aria-labelledby={titleId}>
      <DialogTitle id={titleId}>Delete your comment?</DialogTitle>
      <DialogContent>
        <DialogContentText>“{excerpt}” goes for both of you. This can’t be undone.</DialogContentText>
        <FormAlert
          message={
            remove.error ? (isApiError(remove.error) ? remove.error.message : 'That did not delete.') : undefined
          }
        />
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close} disabled={remove.isPending}>
          Cancel
        </Button>
        <Button
          variant="contained"
          color="error"
          loading={remove.isPending}
          onClick={() => {
            if (!comment) return;
            remove.mutate(comment.id, { onSuccess: close });
          }}
        >
          Delete comment
        </Button>
      </DialogActions>
    </Dialog>
  );
}
