import Typography from '@mui/material/Typography';

/** A student's bake, read-only, with its comment thread (being built). */
export function ClassPlanRoute() {
  return <Typography>Coming soon.</Typography>;
}
