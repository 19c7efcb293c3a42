import Typography from '@mui/material/Typography';

/** A student's culture, read-only, for the class's instructor (being built). */
export function ClassCultureRoute() {
  return <Typography>Coming soon.</Typography>;
}
