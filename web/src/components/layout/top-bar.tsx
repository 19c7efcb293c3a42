import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Toolbar from '@mui/material/Toolbar';
import { Link as RouterLink } from 'react-router-dom';
import { Wordmark } from '@/components/brand/wordmark';
import { AlertBell } from '@/lib/alerts/alert-bell';
import { AccountMenu } from './account-menu';
import { OutboxIndicator } from './outbox-indicator';

export function TopBar() {
  return (
    <AppBar
      position="fixed"
      elevation={0}
      // Above the permanent side rail, so the rail tucks under it.
      sx={{ zIndex: (theme) => theme.zIndex.drawer + 1 }}
    >
      <Toolbar sx={{ gap: 1 }}>
        <Link component={RouterLink} to="/" color="inherit" underline="none" aria-label="Peakwise home">
          <Wordmark onDark />
        </Link>
        <Box sx={{ flexGrow: 1 }} />
        <OutboxIndicator place="bar" />
        <AlertBell />
        <AccountMenu />
      </Toolbar>
    </AppBar>
  );
}
