import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

/** Label and value pairs, two columns wide enough for a phone, as a description list. */
export function FactList({ facts }: { facts: { label: string; value: ReactNode }[] }) {
  return (
    <Box
      component="dl"
      sx={{
        display: 'grid',
        gridTemplateColumns: { xs: 'minmax(7rem, 40%) 1fr', sm: '14rem 1fr' },
        columnGap: 2,
        rowGap: 1.25,
        m: 0,
      }}
    >
      {facts.map(({ label, value }) => (
        <Box key={label} sx={{ display: 'contents' }}>
          <Typography component="dt" variant="body2" color="text.secondary">
            {label}
          </Typography>
          <Typography component="dd" sx={{ m: 0, whiteSpace: 'pre-line', overflowWrap: 'anywhere' }}>
            {value}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}
