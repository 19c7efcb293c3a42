import type { BakingClass } from '@peakwise/shared';
import ContentCopy from '@mui/icons-material/ContentCopy';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { useUpdateClass } from '../api/update-class';
import { ConfirmDialog } from './confirm-dialog';

/** The code students type at Classroom → Join with a code; a new one retires the old. */
export function JoinCodeCard({ bakingClass }: { bakingClass: BakingClass }) {
  const update = useUpdateClass(bakingClass.id);
  const [copied, setCopied] = useState(false);
  const [renewing, setRenewing] = useState(false);
  const code = bakingClass.joinCode;

  const copy = async () => {
    if (!code) return;
    try {
      await navigator.clipboard.writeText(code);
      setCopied(true);
      setTimeout(() => setCopied(false), 3000);
    } catch {
      // No clipboard (an old browser or a page not served over https): the code is on screen to copy by hand.
    }
  };

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Join code
        </Typography>
        {code ? (
          <>
            <Typography color="text.secondary">
              Students sign in, open Classroom → Join with a code, and type:
            </Typography>
            <Typography
              data-testid="join-code"
              sx={{ fontFamily: 'monospace', fontSize: '2rem', letterSpacing: '0.2em', my: 1 }}
              aria-label={`Join code ${code.split('').join(' ')}`}
            >
              {code}
            </Typography>
            <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
              <Button variant="contained" startIcon={<ContentCopy />} onClick={() => void copy()}>
                {copied ? 'Copied' : 'Copy'}
              </Button>
              <Button variant="outlined" onClick={() => setRenewing(true)} disabled={update.isPending}>
                New code
              </Button>
              <Button color="error" onClick={() => update.mutate({ joinCode: false })} loading={update.isPending}>
                Turn off
              </Button>
            </Stack>
          </>
        ) : (
          <>
            <Typography color="text.secondary" sx={{ mb: 2 }}>
              Joining by code is off: only students you invite by e-mail can join.
            </Typography>
            <Button variant="outlined" onClick={() => update.mutate({ joinCode: true })} loading={update.isPending}>
              Turn on joining by code
            </Button>
          </>
        )}
        {update.isError && !renewing && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {isApiError(update.error) ? update.error.message : 'The join code could not be changed.'}
          </Alert>
        )}
      </CardContent>
      <ConfirmDialog
        open={renewing}
        title="Make a new join code?"
        confirmLabel="New code"
        pending={update.isPending}
        error={renewing ? update.error : null}
        onClose={() => setRenewing(false)}
        onConfirm={() => update.mutate({ joinCode: true }, { onSuccess: () => setRenewing(false) })}
      >
        <Typography>The code {code} stops working at once. Students already in the class stay in it.</Typography>
      </ConfirmDialog>
    </Card>
  );
}
