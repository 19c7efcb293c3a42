import Logout from '@mui/icons-material/Logout';
import PersonOutlined from '@mui/icons-material/PersonOutlined';
import SchoolOutlined from '@mui/icons-material/SchoolOutlined';
import Avatar from '@mui/material/Avatar';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import ListItemIcon from '@mui/material/ListItemIcon';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { useSignOut } from '@/lib/auth/sign-out';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';

/** Up to two initials, e.g. "Theo Park" → "TP", for the avatar. */
function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? [parts[0], parts[parts.length - 1]] : parts;
  return letters
    .map((p) => Array.from(p ?? '')[0] ?? '')
    .join('')
    .toUpperCase();
}

/** The signed-in person's name in the app bar, opening their account and sign-out. */
export function AccountMenu() {
  const account = useSignedInAccount();
  const signOut = useSignOut();
  const menuId = useId();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const close = () => setAnchor(null);

  const onSignOut = () => {
    close();
    signOut.mutate();
  };

  return (
    <>
      <Button
        color="inherit"
        onClick={(e) => setAnchor(e.currentTarget)}
        aria-haspopup="menu"
        aria-expanded={anchor ? 'true' : undefined}
        aria-controls={anchor ? menuId : undefined}
        aria-label={`Account menu for ${account.displayName}`}
        sx={{ gap: 1, px: 1, minWidth: 0 }}
      >
        <Typography
          component="span"
          noWrap
          // On a phone the name shares the bar with the wordmark, so it may be cut short.
          sx={{ maxWidth: { xs: 132, sm: 240 } }}
        >
          {account.displayName}
        </Typography>
        <Avatar
          aria-hidden
          sx={{
            width: 32,
            height: 32,
            fontSize: '0.875rem',
            bgcolor: 'secondary.main',
            color: 'secondary.contrastText',
          }}
        >
          {initials(account.displayName)}
        </Avatar>
      </Button>
      <Menu
        id={menuId}
        anchorEl={anchor}
        open={anchor !== null}
        onClose={close}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'right' }}
        transformOrigin={{ vertical: 'top', horizontal: 'right' }}
      >
        <Box sx={{ px: 2, py: 1, maxWidth: 280 }}>
          <Typography noWrap sx={{ fontWeight: 500 }}>
            {account.displayName}
          </Typography>
          <Typography variant="body2" color="text.secondary" noWrap>
            {account.email}
          </Typography>
        </Box>
        <Divider />
        <MenuItem component={RouterLink} to="/account" onClick={close}>
          <ListItemIcon>
            <PersonOutlined fontSize="small" />
          </ListItemIcon>
          Account settings
        </MenuItem>
        <MenuItem component={RouterLink} to="/classes" onClick={close}>
          <ListItemIcon>
            <SchoolOutlined fontSize="small" />
          </ListItemIcon>
          Classroom
        </MenuItem>
        <MenuItem onClick={onSignOut} disabled={signOut.isPending}>
          <ListItemIcon>
            <Logout fontSize="small" />
          </ListItemIcon>
          Sign out
        </MenuItem>
      </Menu>
    </>
  );
}
