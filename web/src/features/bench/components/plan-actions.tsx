import type { BakePlanView } from '@peakwise/shared';
import EventOutlined from '@mui/icons-material/EventOutlined';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { calendarUrl } from '../api/get-plan';
import { useUpdatePlan } from '../api/plan-writes';

/** The calendar file (one event per step) and, while the plan runs, a way to call it off. */
export function PlanActions({ plan, active }: { plan: BakePlanView; active: boolean }) {
  const update = useUpdatePlan(plan.id);
  const [confirm, setConfirm] = useState(false);
  return (
    <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
      <Button
        component="a"
        href={calendarUrl(plan.id)}
        download={`${plan.name}.ics`}
        variant="outlined"
        startIcon={<EventOutlined />}
      >
        Add to calendar (.ics)
      </Button>
      {active && (
        <Button color="error" onClick={() => setConfirm(true)}>
          Cancel plan
        </Button>
      )}
      <Dialog open={confirm} onClose={() => setConfirm(false)} aria-labelledby="cancel-title">
        <DialogTitle id="cancel-title">Cancel this plan?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            The plan stays in your past bakes, marked cancelled. Events you added to a calendar stay there — delete them
            in the calendar.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirm(false)}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            loading={update.isPending}
            onClick={() => update.mutate({ status: 'cancelled' }, { onSuccess: () => setConfirm(false) })}
          >
            Cancel plan
          </Button>
        </DialogActions>
      </Dialog>
    </Stack>
  );
}
