import Typography from '@mui/material/Typography';

/** An invitation link: what joining shares, then accept (being built). */
export function ClassInviteRoute() {
  return <Typography>Coming soon.</Typography>;
}
