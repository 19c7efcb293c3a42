import Typography from '@mui/material/Typography';

/** A student's feeding, read-only, with its comment thread (being built). */
export function ClassFeedingRoute() {
  return <Typography>Coming soon.</Typography>;
}
