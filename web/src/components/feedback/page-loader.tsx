import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';

/** Shown while a route's code or its first data loads. */
export function PageLoader({ label = 'Loading…' }: { label?: string }) {
  return (
    <Box role="status" aria-live="polite" sx={{ display: 'grid', placeItems: 'center', minHeight: '40vh', gap: 2 }}>
      <CircularProgress aria-label={label} />
    </Box>
  );
}
