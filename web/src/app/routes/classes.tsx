import Typography from '@mui/material/Typography';

/** Classes the baker teaches or is in (being built). */
export function ClassesRoute() {
  return <Typography>Coming soon.</Typography>;
}
