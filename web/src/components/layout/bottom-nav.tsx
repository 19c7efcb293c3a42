import BottomNavigation from '@mui/material/BottomNavigation';
import BottomNavigationAction from '@mui/material/BottomNavigationAction';
import Paper from '@mui/material/Paper';
import { Link as RouterLink } from 'react-router-dom';
import { useNav } from './use-nav';

/** Phone navigation: in thumb reach at the bottom of the screen. */
export function BottomNav() {
  const { items, active } = useNav();
  return (
    <Paper
      component="nav"
      aria-label="Main"
      data-testid="bottom-nav"
      elevation={3}
      square
      sx={{
        position: 'fixed',
        insetInline: 0,
        bottom: 0,
        zIndex: (theme) => theme.zIndex.appBar,
        // Keep the bar above the home indicator on phones with no home button.
        pb: 'env(safe-area-inset-bottom)',
      }}
    >
      <BottomNavigation showLabels value={active?.to ?? false}>
        {items.map((item) => (
          <BottomNavigationAction
            key={item.to}
            value={item.to}
            label={item.label}
            icon={<item.icon />}
            component={RouterLink}
            to={item.to}
            aria-current={active === item ? 'page' : undefined}
          />
        ))}
      </BottomNavigation>
    </Paper>
  );
}
