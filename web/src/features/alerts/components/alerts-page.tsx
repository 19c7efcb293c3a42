import type { Alert } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { formatClock } from '@/lib/format/duration';
import { useNow } from '@/lib/use-now';
import { useAlerts } from '../api/list-alerts';
import { useMarkAlertRead, useMarkAllAlertsRead } from '../api/mark-read';

const PAGE_SIZE = 20;

const OPEN_LABEL: Record<Alert['subjectType'], string> = { culture: 'Open culture', 'bake-plan': 'Open bake plan' };

/** A comment is news, not a reminder: it leads to its thread and says when it came. */
const openLabel = (alert: Alert) => (alert.kind === 'comment' ? 'Open the comments' : OPEN_LABEL[alert.subjectType]);
const whenLabel = (alert: Alert) => (alert.kind === 'comment' ? 'Sent' : 'Due');

function AlertCard({ alert, timeZone, now }: { alert: Alert; timeZone: string; now: Date }) {
  const markRead = useMarkAlertRead();
  const unread = alert.readAt === null;
  return (
    <Card
      component="article"
      aria-label={alert.title}
      variant={unread ? 'elevation' : 'outlined'}
      sx={unread ? { borderLeft: 4, borderColor: 'secondary.main' } : undefined}
    >
      <CardContent sx={{ display: 'grid', gap: 0.5, pb: 1 }}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          {unread && <Chip label="New" color="secondary" size="small" />}
          <Typography variant="body2" color="text.secondary">
            {whenLabel(alert)} {formatClock(alert.dueAt, timeZone, now)}
          </Typography>
        </Stack>
        <Typography variant="h3" component="h2">
          {alert.title}
        </Typography>
        <Typography variant="body2">{alert.body}</Typography>
      </CardContent>
      <CardActions sx={{ px: 2, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        <Button component={RouterLink} to={alert.linkPath} variant="outlined" size="small">
          {openLabel(alert)}
        </Button>
        {unread && (
          <Button size="small" onClick={() => markRead.mutate(alert.id)} disabled={markRead.isPending}>
            Mark read
          </Button>
        )}
      </CardActions>
    </Card>
  );
}

/** Alerts that have come due, unread first; the list refreshes itself every few seconds. */
export function AlertsPage() {
  const account = useSignedInAccount();
  const now = useNow();
  const [limit, setLimit] = useState(PAGE_SIZE);
  const alerts = useAlerts({ limit, offset: 0 });
  const markAll = useMarkAllAlertsRead();

  let body;
  if (alerts.isPending) body = <PageLoader label="Loading alerts…" />;
  else if (alerts.isError) body = <LoadError error={alerts.error} onRetry={() => void alerts.refetch()} />;
  else if (alerts.data.items.length === 0) {
    body = (
      <Typography color="text.secondary">
        No alerts yet. Log a feeding with rise checks, or plan a bake, and reminders arrive here when they are due.
      </Typography>
    );
  } else {
    const { items, total } = alerts.data;
    const unread = items.filter((a) => a.readAt === null).length;
    body = (
      <Stack spacing={2}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
          <Typography variant="body2" color="text.secondary">
            {unread === 0 ? 'All read' : `${unread} unread`} · {total} in all
          </Typography>
          <Button onClick={() => markAll.mutate()} disabled={unread === 0 || markAll.isPending}>
            Mark all read
          </Button>
        </Stack>
        {items.map((alert) => (
          <AlertCard key={alert.id} alert={alert} timeZone={account.timeZone} now={now} />
        ))}
        {items.length < total && (
          <Button variant="outlined" onClick={() => setLimit((l) => l + PAGE_SIZE)}>
            Show older alerts
          </Button>
        )}
      </Stack>
    );
  }

  return (
    <Page
      title="Alerts"
      intro={
        <>
          Reminders for your cultures and bakes, in your time zone ({account.timeZone}).{' '}
          <Box component={RouterLink} to="/account/alerts" sx={{ color: 'primary.main' }}>
            Alert settings
          </Box>
        </>
      }
    >
      {body}
    </Page>
  );
}
