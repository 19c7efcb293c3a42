import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { isoToWallTime, wallTimeToIso } from '../utils/zoned-time';

interface Props {
  title: string;
  timeZone: string;
  busy: boolean;
  /** No time: now. */
  onDone: (at?: string) => void;
}

/** The big "Done" for the current step (now), and a smaller way to say when it really happened. */
export function DoneControls({ title, timeZone, busy, onDone }: Props) {
  const [open, setOpen] = useState(false);
  const [wall, setWall] = useState('');
  const [openedAt, setOpenedAt] = useState(0);
  const iso = wallTimeToIso(wall, timeZone);
  // A minute's grace for a phone clock a little ahead of the server's.
  const future = iso !== null && Date.parse(iso) > openedAt + 60_000;

  return (
    <Stack spacing={0.5} sx={{ pt: 1 }}>
      <Button
        variant="contained"
        size="large"
        loading={busy}
        onClick={() => onDone()}
        sx={{ minHeight: 56, fontSize: '1.125rem' }}
      >
        Done
      </Button>
      <Button
        size="small"
        disabled={busy}
        onClick={() => {
          const opened = new Date();
          setOpenedAt(opened.getTime());
          setWall(isoToWallTime(opened, timeZone));
          setOpen(true);
        }}
        sx={{ alignSelf: 'flex-start' }}
      >
        Done at another time…
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} aria-labelledby="done-at-title">
        <DialogTitle id="done-at-title">When did you do it?</DialogTitle>
        <DialogContent>
          <TextField
            label={title}
            type="datetime-local"
            value={wall}
            onChange={(e) => setWall(e.target.value)}
            error={iso === null || future}
            helperText={iso === null ? 'Enter a date and time.' : future ? 'That is still to come.' : `In ${timeZone}`}
            slotProps={{ inputLabel: { shrink: true } }}
            sx={{ mt: 1 }}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)}>Back</Button>
          <Button
            variant="contained"
            disabled={iso === null || future}
            onClick={() => {
              setOpen(false);
              if (iso) onDone(iso);
            }}
          >
            Record
          </Button>
        </DialogActions>
      </Dialog>
    </Stack>
  );
}
