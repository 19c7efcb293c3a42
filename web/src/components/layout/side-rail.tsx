import Box from '@mui/material/Box';
import ButtonBase from '@mui/material/ButtonBase';
import Drawer from '@mui/material/Drawer';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import { alpha } from '@mui/material/styles';
import { Link as RouterLink } from 'react-router-dom';
import { useNav } from './use-nav';

export const SIDE_RAIL_WIDTH = 96;

/** Wide-screen navigation: a narrow permanent rail, icon over label, under the app bar. */
export function SideRail() {
  const { items, active } = useNav();
  return (
    <Drawer
      variant="permanent"
      sx={{
        width: SIDE_RAIL_WIDTH,
        flexShrink: 0,
        '& .MuiDrawer-paper': {
          width: SIDE_RAIL_WIDTH,
          boxSizing: 'border-box',
          bgcolor: 'background.default',
        },
      }}
    >
      <Toolbar />
      <Box component="nav" aria-label="Main" data-testid="side-rail" sx={{ display: 'grid', gap: 1, py: 2 }}>
        {items.map((item) => {
          const selected = active === item;
          return (
            <ButtonBase
              key={item.to}
              component={RouterLink}
              to={item.to}
              aria-current={selected ? 'page' : undefined}
              sx={{
                flexDirection: 'column',
                gap: 0.5,
                py: 1,
                mx: 1,
                borderRadius: 2,
                color: selected ? 'text.primary' : 'text.secondary',
                ...(selected
                  ? {}
                  : {
                      '&:hover .rail-pill, &.Mui-focusVisible .rail-pill': {
                        bgcolor: (theme) => alpha(theme.palette.primary.main, 0.08),
                      },
                    }),
              }}
            >
              <Box
                className="rail-pill"
                sx={{
                  display: 'grid',
                  placeItems: 'center',
                  width: 56,
                  height: 32,
                  borderRadius: 4,
                  color: selected ? 'primary.main' : 'inherit',
                  bgcolor: (theme) => (selected ? alpha(theme.palette.secondary.main, 0.28) : 'transparent'),
                }}
              >
                <item.icon />
              </Box>
              <Typography variant="caption" sx={{ fontWeight: selected ? 700 : 500 }}>
                {item.label}
              </Typography>
            </ButtonBase>
          );
        })}
      </Box>
    </Drawer>
  );
}
