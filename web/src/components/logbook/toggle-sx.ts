import type { SxProps, Theme } from '@mui/material/styles';

/** Big toggle buttons whose chosen one is filled, so it reads at arm's length on a floury phone. */
export const bigToggleSx: SxProps<Theme> = {
  minHeight: 52,
  fontSize: '1rem',
  '&.Mui-selected, &.Mui-selected:hover': { bgcolor: 'primary.main', color: 'primary.contrastText' },
};
