import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import SyncProblem from '@mui/icons-material/SyncProblem';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { formatClock } from '@/lib/format/duration';
import { discardEntry, sendNow } from '@/lib/outbox/outbox';
import { KIND_LABEL, type OutboxEntry } from '@/lib/outbox/outbox-types';
import { notYetSentWords, useOnline, useOutbox } from '@/lib/outbox/use-outbox';

/**
 * The word on writes kept on this device: "Offline", or "3 not yet sent" opening the list, where
 * a write the server refused can be opened or discarded. Nothing when all is sent. In the top
 * bar from tablet width up (`place="bar"`); on a phone the bar has no room, so it is a strip at
 * the top of the page instead (`place="page"`).
 */
export function OutboxIndicator({ place }: { place: 'bar' | 'page' }) {
  const account = useSignedInAccount();
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const online = useOnline();
  const outbox = useOutbox(account.id);
  const [open, setOpen] = useState(false);
  const count = outbox.entries.length;
  if ((count === 0 && online) || phone !== (place === 'page')) return null;

  const failed = outbox.failed > 0;
  const Icon = failed ? SyncProblem : online ? CloudUploadOutlined : CloudOffOutlined;
  const words = count === 0 ? 'Offline' : notYetSentWords(count);
  return (
    <>
      {place === 'bar' ? (
        <Button
          color="inherit"
          size="small"
          variant="outlined"
          startIcon={<Icon />}
          onClick={() => setOpen(true)}
          data-testid="outbox-indicator"
          sx={{
            borderRadius: 5,
            whiteSpace: 'nowrap',
            borderColor: failed ? 'secondary.main' : 'rgba(255,255,255,0.5)',
            color: failed ? 'secondary.main' : 'inherit',
          }}
        >
          {words}
        </Button>
      ) : (
        <Button
          fullWidth
          color={failed ? 'error' : 'primary'}
          startIcon={<Icon />}
          onClick={() => setOpen(true)}
          data-testid="outbox-indicator"
          sx={{
            justifyContent: 'flex-start',
            borderRadius: 0,
            px: 2,
            py: 1,
            bgcolor: failed ? 'rgba(211, 47, 47, 0.08)' : 'rgba(47, 72, 88, 0.08)',
            borderBottom: 1,
            borderColor: 'divider',
          }}
        >
          {count === 0 ? 'Offline: what you save is kept on this device' : `${words} · saved on this device`}
        </Button>
      )}
      <OutboxDialog open={open} onClose={() => setOpen(false)} entries={outbox.entries} online={online} />
    </>
  );
}

function OutboxDialog({
  open,
  onClose,
  entries,
  online,
}: {
  open: boolean;
  onClose: () => void;
  entries: readonly OutboxEntry[];
  online: boolean;
}) {
  const account = useSignedInAccount();
  const navigate = useNavigate();
  const now = new Date();
  const waiting = entries.some((e) => e.state === 'waiting');
  const openEntry = (entry: OutboxEntry) => {
    onClose();
    void navigate(entry.openPath);
  };

  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="xs" aria-labelledby="outbox-title">
      <DialogTitle id="outbox-title">Not yet sent</DialogTitle>
      <DialogContent>
        <Stack spacing={2}>
          <Typography color="text.secondary">
            {entries.length === 0
              ? 'You are offline. What you save now is kept on this device and sent when you are back online.'
              : online
                ? 'Kept on this device and sent in the order you saved them. Peakwise keeps trying by itself.'
                : 'You are offline. These are kept on this device and sent, in order, when you are back online.'}
          </Typography>
          {entries.length > 0 && (
            <List dense disablePadding aria-label="Writes not yet sent">
              {entries.map((entry) => (
                <ListItem key={entry.key} disableGutters divider alignItems="flex-start">
                  <ListItemText
                    primary={`${KIND_LABEL[entry.kind]} · saved ${formatClock(entry.savedAt, account.timeZone, now)}`}
                    secondary={
                      <>
                        {entry.detail && <span>{entry.detail}</span>}
                        {entry.state === 'failed' && entry.error && (
                          <Alert severity="error" sx={{ mt: 1 }}>
                            {entry.error.status === 0 ? entry.error.message : `Not accepted: ${entry.error.message}`}
                          </Alert>
                        )}
                        {entry.state === 'failed' && (
                          <Stack direction="row" spacing={1} component="span" sx={{ mt: 1, display: 'flex' }}>
                            <Button size="small" onClick={() => openEntry(entry)}>
                              Open
                            </Button>
                            <Button size="small" color="error" onClick={() => void discardEntry(entry.key)}>
                              Discard
                            </Button>
                          </Stack>
                        )}
                      </>
                    }
                    slotProps={{ secondary: { component: 'div' } }}
                  />
                </ListItem>
              ))}
            </List>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        {waiting && online && <Button onClick={sendNow}>Send now</Button>}
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
