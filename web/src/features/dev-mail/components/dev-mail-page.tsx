import type { DevMailMessage } from '@peakwise/shared';
import ArrowBack from '@mui/icons-material/ArrowBack';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { PageLoader } from '@/components/feedback/page-loader';
import { isApiError } from '@/lib/api-client';
import { useDevMail } from '../api/dev-mail';
import { MailView } from './mail-view';
import { PushList } from './push-list';

const keyOf = (m: DevMailMessage) => `${m.date}|${m.messageId ?? m.subject}`;

/** The development mailbox: a list of subjects, one message open beside it (below it on a phone). */
export function DevMailPage() {
  const mail = useDevMail();
  const [openKey, setOpenKey] = useState<string | null>(null);
  const items = mail.data?.items ?? [];
  const open = items.find((m) => keyOf(m) === openKey) ?? null;

  return (
    <Box component="main" sx={{ maxWidth: 1200, mx: 'auto', px: 2, py: { xs: 2, sm: 4 }, display: 'grid', gap: 2 }}>
      <title>Development mail and push · Peakwise</title>
      <Box>
        <Typography variant="h1">Mail and push sent by Peakwise in development</Typography>
        <Typography color="text.secondary">
          Caught by the local fake mail server and push service; nothing here was delivered to anyone. Newest first.
        </Typography>
      </Box>
      <PushList />
      <Typography variant="h2">Mail</Typography>
      {mail.isPending && <PageLoader />}
      {mail.isError && (
        <Alert severity="warning">
          {isApiError(mail.error) && mail.error.status === 404
            ? 'This server has no development mailbox (it is off in production).'
            : mail.error.message}
        </Alert>
      )}
      {mail.isSuccess && items.length === 0 && <Alert severity="info">No mail yet.</Alert>}
      {items.length > 0 && (
        <Box
          sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 360px) minmax(0, 1fr)' } }}
        >
          <Card sx={{ display: { xs: open ? 'none' : 'block', md: 'block' }, alignSelf: 'start' }}>
            <List aria-label="Messages" disablePadding>
              {items.map((m) => (
                <ListItemButton key={keyOf(m)} selected={open === m} onClick={() => setOpenKey(keyOf(m))} divider>
                  <ListItemText
                    primary={m.subject || '(no subject)'}
                    secondary={`${m.to.join(', ')} · ${new Date(m.date).toLocaleString()}`}
                    slotProps={{ secondary: { sx: { overflowWrap: 'anywhere' } } }}
                  />
                </ListItemButton>
              ))}
            </List>
          </Card>
          {open ? (
            <Box sx={{ minWidth: 0 }}>
              <Button
                startIcon={<ArrowBack />}
                onClick={() => setOpenKey(null)}
                sx={{ display: { md: 'none' }, mb: 1 }}
              >
                All messages
              </Button>
              <MailView key={keyOf(open)} message={open} />
            </Box>
          ) : (
            <Typography color="text.secondary" sx={{ display: { xs: 'none', md: 'block' } }}>
              Choose a message to read it.
            </Typography>
          )}
        </Box>
      )}
    </Box>
  );
}
