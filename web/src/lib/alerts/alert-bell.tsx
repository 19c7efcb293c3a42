import NotificationsOutlined from '@mui/icons-material/NotificationsOutlined';
import Badge from '@mui/material/Badge';
import IconButton from '@mui/material/IconButton';
import { Link as RouterLink } from 'react-router-dom';
import { useUnreadCount } from './get-unread-count';

/** The top bar's way into the Alerts page, with the number of unread alerts. */
export function AlertBell() {
  const unread = useUnreadCount().data?.unread ?? 0;
  const label = unread === 0 ? 'Alerts, none unread' : `Alerts, ${unread} unread`;
  return (
    <IconButton component={RouterLink} to="/alerts" color="inherit" aria-label={label} data-testid="alert-bell">
      <Badge badgeContent={unread} color="secondary" max={99}>
        <NotificationsOutlined />
      </Badge>
    </IconButton>
  );
}
