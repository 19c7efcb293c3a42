import type { CommentView } from '@peakwise/shared';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Tooltip from '@mui/material/Tooltip';
import Typography from '@mui/material/Typography';
import { commentTime, commentTimeExact } from '../utils/comment-time';
import { roleChip } from '../utils/comment-words';

interface Props {
  comment: CommentView;
  now: Date;
  timeZone: string;
  onDelete: (comment: CommentView) => void;
}

/** One comment: who (and what they are to the reader), when, what; a delete button on one's own. */
export function CommentItem({ comment, now, timeZone, onDelete }: Props) {
  const chip = roleChip(comment);
  const when = commentTime(comment.createdAt, now, timeZone);
  return (
    <Box
      component="li"
      data-testid="comment"
      sx={{
        py: 1.5,
        pl: 1.5,
        borderLeft: 3,
        borderColor: comment.author.role === 'instructor' ? 'secondary.main' : 'divider',
      }}
    >
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
        <Typography sx={{ fontWeight: 600 }}>{comment.author.displayName}</Typography>
        <Chip
          size="small"
          label={chip}
          color={chip === 'Instructor' ? 'secondary' : 'default'}
          variant={chip === 'You' ? 'outlined' : 'filled'}
        />
        <Tooltip title={commentTimeExact(comment.createdAt, timeZone)}>
          <Typography component="time" dateTime={comment.createdAt} variant="body2" color="text.secondary">
            {when}
          </Typography>
        </Tooltip>
        {comment.mine && (
          <IconButton
            size="small"
            aria-label={`Delete your comment of ${when}`}
            onClick={() => onDelete(comment)}
            sx={{ ml: 'auto !important' }}
          >
            <DeleteOutlined fontSize="small" />
          </IconButton>
        )}
      </Stack>
      <Typography sx={{ mt: 0.5, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' }}>{comment.body}</Typography>
    </Box>
  );
}
