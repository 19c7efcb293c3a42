import Typography from '@mui/material/Typography';

/** One class: roster, progress chart, invitations (being built). */
export function ClassRoute() {
  return <Typography>Coming soon.</Typography>;
}
