import type { BakingClass } from '@peakwise/shared';
import Add from '@mui/icons-material/Add';
import Key from '@mui/icons-material/KeyOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useNow } from '@/lib/use-now';
import { useClasses } from '../api/get-classes';
import { ClassList } from './class-list';
import { LeaveClassDialog } from './leave-class-dialog';
import { NewClassForm } from './new-class-form';

const PAGE_SIZE = 50;

/** The classes the baker teaches and the ones they are in; instructors start new ones here. */
export function ClassesPage() {
  const account = useSignedInAccount();
  const classes = useClasses({ limit: PAGE_SIZE });
  const navigate = useNavigate();
  const now = useNow(60_000);
  const [creating, setCreating] = useState(false);
  const [leaving, setLeaving] = useState<BakingClass | null>(null);
  const [left, setLeft] = useState<string | null>(null);
  const mayTeach = account.role === 'instructor' || account.role === 'admin';

  const actions = (
    <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
      {mayTeach && (
        <Button variant="contained" startIcon={<Add />} onClick={() => setCreating(true)}>
          New class
        </Button>
      )}
      <Button
        variant={mayTeach ? 'outlined' : 'contained'}
        startIcon={<Key />}
        component={RouterLink}
        to="/classes/join"
      >
        Join with a code
      </Button>
    </Stack>
  );

  let body;
  if (classes.isPending) body = <PageLoader label="Loading classes" />;
  else if (classes.isError) body = <LoadError error={classes.error} onRetry={() => void classes.refetch()} />;
  else if (classes.data.items.length === 0) {
    body = (
      <Card>
        <CardContent>
          <Typography variant="h2" gutterBottom>
            No classes yet
          </Typography>
          <Typography color="text.secondary">
            {mayTeach
              ? 'Create a class, then invite students by e-mail or give them its join code.'
              : 'Your instructor sends you an invitation by e-mail or gives you a join code. Joining shares your cultures’ logs and your bakes with them, read-only, while you are in the class.'}
          </Typography>
        </CardContent>
      </Card>
    );
  } else {
    body = (
      <>
        <ClassList classes={classes.data.items} account={account} now={now} onLeave={setLeaving} />
        {classes.data.total > classes.data.items.length && (
          <Typography color="text.secondary">
            Showing {classes.data.items.length} of {classes.data.total} classes.
          </Typography>
        )}
      </>
    );
  }

  return (
    <Page title="Classroom" intro={mayTeach ? 'Classes you teach and classes you are in.' : 'The classes you are in.'}>
      {actions}
      {left && (
        <Alert severity="success" onClose={() => setLeft(null)}>
          You left {left}. Its instructor no longer sees your logs.
        </Alert>
      )}
      {body}
      <Dialog open={creating} onClose={() => setCreating(false)} fullWidth maxWidth="sm">
        <DialogTitle>New class</DialogTitle>
        <DialogContent sx={{ pt: 1 }}>
          <Typography color="text.secondary" sx={{ mb: 2 }}>
            You can invite students as soon as it exists.
          </Typography>
          <NewClassForm onCreated={(created) => void navigate(`/classes/${created.id}`)} />
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setCreating(false)}>Cancel</Button>
        </DialogActions>
      </Dialog>
      <LeaveClassDialog
        bakingClass={leaving}
        onClose={() => setLeaving(null)}
        onLeft={() => {
          setLeft(leaving?.name ?? 'the class');
          setLeaving(null);
        }}
      />
    </Page>
  );
}
