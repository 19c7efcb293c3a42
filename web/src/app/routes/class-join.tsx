import Typography from '@mui/material/Typography';

/** Join a class with a code (being built). */
export function ClassJoinRoute() {
  return <Typography>Coming soon.</Typography>;
}
