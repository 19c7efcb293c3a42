import type { SxProps, Theme } from '@mui/material/styles';

/** A chosen toggle is filled, so which view or batch size is on reads at a glance. */
export const filledToggleSx: SxProps<Theme> = {
  '& .MuiToggleButton-root.Mui-selected, & .MuiToggleButton-root.Mui-selected:hover': {
    bgcolor: 'primary.main',
    color: 'primary.contrastText',
  },
};
