import CloseOutlined from '@mui/icons-material/CloseOutlined';
import Replay from '@mui/icons-material/Replay';
import Box from '@mui/material/Box';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { formatBytes } from '../utils/photo-checks';
import { percent, type UploadItem } from '../utils/upload-state';

function statusWords(item: UploadItem): string {
  switch (item.status) {
    case 'waiting':
      return 'Waiting…';
    case 'sending':
      return `Sending · ${percent(item)} %`;
    case 'processing':
      return 'Sent · preparing the photo…';
    case 'done':
      return 'Added';
    case 'refused':
    case 'failed':
      return item.message ?? 'Could not be added.';
  }
}

/** One picked file: its name and size, a progress bar while it goes up, then how it ended. */
export function UploadRow({
  item,
  onRetry,
  onDismiss,
}: {
  item: UploadItem;
  onRetry: () => void;
  onDismiss: () => void;
}) {
  const bad = item.status === 'failed' || item.status === 'refused';
  const moving = item.status === 'sending' || item.status === 'processing' || item.status === 'waiting';
  return (
    <Box
      component="li"
      data-testid="upload-row"
      data-status={item.status}
      sx={{ border: 1, borderColor: bad ? 'error.light' : 'divider', borderRadius: 2, px: 1.5, py: 1 }}
    >
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
        <Box sx={{ flex: 1, minWidth: 0 }}>
          <Typography variant="body2" noWrap title={item.name}>
            {item.name}{' '}
            <Typography component="span" variant="body2" color="text.secondary">
              · {formatBytes(item.size)}
            </Typography>
          </Typography>
          <Typography
            variant="body2"
            color={bad ? 'error' : item.status === 'done' ? 'success.main' : 'text.secondary'}
            role={bad ? 'alert' : undefined}
          >
            {statusWords(item)}
          </Typography>
        </Box>
        {item.status === 'failed' && item.retryable && (
          <IconButton onClick={onRetry} aria-label={`Try ${item.name} again`}>
            <Replay />
          </IconButton>
        )}
        {!moving && (
          <IconButton onClick={onDismiss} aria-label={`Remove ${item.name} from this list`}>
            <CloseOutlined />
          </IconButton>
        )}
      </Stack>
      {moving && (
        <LinearProgress
          variant={item.status === 'processing' ? 'indeterminate' : 'determinate'}
          value={percent(item)}
          aria-label={`${item.name}: ${statusWords(item)}`}
          sx={{ mt: 0.75, borderRadius: 1 }}
        />
      )}
    </Box>
  );
}
