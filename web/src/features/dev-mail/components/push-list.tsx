import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { isApiError } from '@/lib/api-client';
import { useDevPush } from '../api/dev-push';

/** Push notifications the local fake push service received, as a phone would show them. */
export function PushList() {
  const push = useDevPush();
  // No fake push service on this server (production, or started without one): say nothing.
  if (push.isError && isApiError(push.error) && push.error.status === 404) return null;
  const items = push.data?.items ?? [];
  return (
    <section aria-labelledby="dev-push-heading">
      <Typography id="dev-push-heading" variant="h2" gutterBottom>
        Push notifications
      </Typography>
      {push.isError && <Alert severity="warning">{push.error.message}</Alert>}
      {push.isSuccess && items.length === 0 && <Alert severity="info">No push notifications yet.</Alert>}
      {items.length > 0 && (
        <Card>
          <List aria-label="Push notifications" disablePadding>
            {items.map((m) => (
              <ListItem key={`${m.receivedAt}|${m.title}`} divider>
                <ListItemText
                  primary={m.title}
                  secondary={
                    <>
                      {m.body}
                      <br />
                      {m.device ?? 'A device no longer subscribed'} · {new Date(m.receivedAt).toLocaleString()} · opens{' '}
                      <RouterLink to={m.url}>{m.url}</RouterLink>
                    </>
                  }
                />
              </ListItem>
            ))}
          </List>
        </Card>
      )}
    </section>
  );
}
