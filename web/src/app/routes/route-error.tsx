import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useRouteError } from 'react-router-dom';

// A lazy route's chunk fails to load when a new version was deployed while the tab stayed open;
// reloading fetches the new build, so that is the one thing we offer.
function isStaleBuild(error: unknown): boolean {
  return error instanceof TypeError && /dynamically imported module|Importing a module script/i.test(error.message);
}

export function RouteError() {
  const error = useRouteError();
  const stale = isStaleBuild(error);
  return (
    <Box
      component="main"
      role="alert"
      sx={{ minHeight: '100dvh', display: 'grid', placeContent: 'center', gap: 2, px: 3, textAlign: 'center' }}
    >
      <Typography variant="h1">{stale ? 'Peakwise has been updated' : 'Something went wrong'}</Typography>
      <Typography color="text.secondary" sx={{ maxWidth: 420 }}>
        {stale
          ? 'Reload to get the latest version. Nothing you saved is lost.'
          : 'This page ran into a problem. Reloading usually helps; your saved logs are safe.'}
      </Typography>
      <Box>
        <Button variant="contained" size="large" onClick={() => window.location.reload()}>
          Reload
        </Button>
      </Box>
    </Box>
  );
}
