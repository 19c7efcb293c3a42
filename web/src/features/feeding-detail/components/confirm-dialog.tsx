import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useId, useState, type ReactNode } from 'react';
import { FormAlert } from '@/components/form/form-alert';
import { isApiError } from '@/lib/api-client';

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  onConfirm: () => Promise<unknown>;
  onClose: () => void;
}

/** "Are you sure?" for a deletion: says what goes, waits for the server, shows its refusal. */
export function ConfirmDialog({ open, title, children, confirmLabel, onConfirm, onClose }: ConfirmDialogProps) {
  const titleId = useId();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string>();

  const close = () => {
    if (pending) return;
    setError(undefined);
    onClose();
  };
  const confirm = async () => {
    setPending(true);
    setError(undefined);
    try {
      await onConfirm();
      onClose();
    } catch (e) {
      setError(isApiError(e) ? e.message : 'Something went wrong. Please try again.');
    } finally {
      setPending(false);
    }
  };

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="xs" aria-labelledby={titleId}>
      <DialogTitle id={titleId}>{title}</DialogTitle>
      <DialogContent>
        <DialogContentText component="div">{children}</DialogContentText>
        <FormAlert message={error} />
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close} disabled={pending}>
          Cancel
        </Button>
        <Button variant="contained" color="error" loading={pending} onClick={() => void confirm()}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
