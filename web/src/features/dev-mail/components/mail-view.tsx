import type { DevMailMessage } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

/**
 * One message: headers, then its HTML or text. The HTML runs in an iframe with an empty sandbox
 * (no scripts, no same-origin, no forms): mail is untrusted content even when we wrote it.
 */
export function MailView({ message }: { message: DevMailMessage }) {
  const [tab, setTab] = useState<'html' | 'text'>(message.html ? 'html' : 'text');
  return (
    <Stack spacing={2} sx={{ minWidth: 0 }}>
      <Box>
        <Typography variant="h2" sx={{ fontSize: '1.25rem', overflowWrap: 'anywhere' }}>
          {message.subject || '(no subject)'}
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ overflowWrap: 'anywhere' }}>
          To {message.to.join(', ')} · from {message.from}
          <br />
          {new Date(message.date).toLocaleString()}
          {message.messageId && <> · Message-ID {message.messageId}</>}
        </Typography>
      </Box>
      <Tabs value={tab} onChange={(_, value: 'html' | 'text') => setTab(value)} aria-label="Message format">
        <Tab value="html" label="HTML" disabled={!message.html} />
        <Tab value="text" label="Plain text" />
      </Tabs>
      {tab === 'html' && message.html ? (
        <Box
          component="iframe"
          title={`HTML of “${message.subject}”`}
          sandbox=""
          srcDoc={message.html}
          sx={{ width: '100%', height: { xs: 520, md: 640 }, border: 1, borderColor: 'divider', borderRadius: 1 }}
        />
      ) : (
        <Box
          component="pre"
          sx={{
            m: 0,
            p: 2,
            bgcolor: 'background.paper',
            border: 1,
            borderColor: 'divider',
            borderRadius: 1,
            whiteSpace: 'pre-wrap',
            overflowWrap: 'anywhere',
            fontSize: '0.875rem',
          }}
        >
          {message.text}
        </Box>
      )}
    </Stack>
  );
}
