import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import LinearProgress from '@mui/material/LinearProgress';
import Toolbar from '@mui/material/Toolbar';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { Outlet, useNavigation } from 'react-router-dom';
import { BottomNav } from './bottom-nav';
import { OutboxIndicator } from './outbox-indicator';
import { SideRail } from './side-rail';
import { TopBar } from './top-bar';

// Room for the fixed bottom bar (56 px) so the last card is never hidden behind it.
const BOTTOM_NAV_SPACE = 'calc(56px + env(safe-area-inset-bottom) + 24px)';

/** The signed-in frame: app bar on top, then a side rail (wide) or a bottom bar (phone). */
export function AppShell() {
  const theme = useTheme();
  // noSsr: decide on the first render, so a phone never flashes the rail.
  const wide = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const navigation = useNavigation();

  return (
    <Box sx={{ display: 'flex', minHeight: '100dvh' }}>
      <TopBar />
      {navigation.state === 'loading' && (
        <LinearProgress
          color="secondary"
          aria-label="Loading page"
          sx={{ position: 'fixed', top: 0, insetInline: 0, zIndex: theme.zIndex.drawer + 2 }}
        />
      )}
      {wide && <SideRail />}
      <Box component="main" sx={{ flexGrow: 1, minWidth: 0, pb: wide ? 4 : BOTTOM_NAV_SPACE }}>
        <Toolbar />
        <OutboxIndicator place="page" />
        <Container maxWidth="md" sx={{ pt: { xs: 2.5, md: 4 } }}>
          <Outlet />
        </Container>
      </Box>
      {!wide && <BottomNav />}
    </Box>
  );
}
