import type { BakingClass } from '@peakwise/shared';
import Typography from '@mui/material/Typography';
import { useLeaveClass } from '../api/leave-class';
import { ConfirmDialog } from './confirm-dialog';

interface LeaveClassDialogProps {
  bakingClass: BakingClass | null;
  onClose: () => void;
  onLeft: () => void;
}

/** Leaving ends the sharing at once; the student's logs stay theirs. */
export function LeaveClassDialog({ bakingClass, onClose, onLeft }: LeaveClassDialogProps) {
  const leave = useLeaveClass();
  const close = () => {
    leave.reset();
    onClose();
  };
  return (
    <ConfirmDialog
      open={bakingClass !== null}
      title={bakingClass ? `Leave ${bakingClass.name}?` : 'Leave the class?'}
      confirmLabel="Leave class"
      pending={leave.isPending}
      error={leave.error}
      onClose={close}
      onConfirm={() => {
        if (bakingClass) leave.mutate(bakingClass.id, { onSuccess: onLeft });
      }}
    >
      <Typography>
        Sharing ends at once: {bakingClass?.instructor.displayName ?? 'the instructor'} will no longer see your
        cultures’ logs or your bakes. Your logs stay yours.
      </Typography>
      <Typography color="text.secondary" sx={{ mt: 1 }}>
        To come back later you need a new invitation or the class’s join code.
      </Typography>
    </ConfirmDialog>
  );
}
