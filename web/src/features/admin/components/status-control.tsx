import type { AdminAccount } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';

interface StatusControlProps {
  account: AdminAccount;
  isSelf: boolean;
  pending: boolean;
  onChange: (disabled: boolean) => void;
}

/**
 * Whether an account may sign in, and the button that changes it. Disabling asks first: it signs
 * the person out on every device at once. An admin cannot disable themselves (the API refuses too).
 */
export function StatusControl({ account, isSelf, pending, onChange }: StatusControlProps) {
  const [confirming, setConfirming] = useState(false);
  const disabled = account.disabledAt !== null;
  return (
    <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
      {disabled ? <Chip size="small" color="warning" label="Disabled" /> : <Chip size="small" label="Active" />}
      {!isSelf &&
        (disabled ? (
          <Button size="small" disabled={pending} onClick={() => onChange(false)}>
            Enable<VisuallyHidden> {account.displayName}</VisuallyHidden>
          </Button>
        ) : (
          <Button size="small" color="warning" disabled={pending} onClick={() => setConfirming(true)}>
            Disable<VisuallyHidden> {account.displayName}</VisuallyHidden>
          </Button>
        ))}
      <Dialog open={confirming} onClose={() => setConfirming(false)} aria-labelledby={`disable-${account.id}`}>
        <DialogTitle id={`disable-${account.id}`}>Disable {account.displayName}?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            They are signed out on every device at once and cannot sign in until an admin enables the account again.
            Their logbook stays as it is.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirming(false)}>Cancel</Button>
          <Button
            color="warning"
            variant="contained"
            onClick={() => {
              setConfirming(false);
              onChange(true);
            }}
          >
            Disable account
          </Button>
        </DialogActions>
      </Dialog>
    </Stack>
  );
}
