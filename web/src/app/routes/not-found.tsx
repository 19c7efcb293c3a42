import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { Wordmark } from '@/components/brand/wordmark';

/** Any path we don't have. Works signed in or out: Home sends a signed-out visitor to sign in. */
export function NotFoundRoute() {
  return (
    <Box
      component="main"
      sx={{
        minHeight: '100dvh',
        display: 'grid',
        placeContent: 'center',
        justifyItems: 'center',
        textAlign: 'center',
        gap: 2,
        px: 3,
      }}
    >
      <title>Page not found · Peakwise</title>
      <Box sx={{ color: 'primary.main' }}>
        <Wordmark />
      </Box>
      <Typography variant="h1">This page didn’t rise</Typography>
      <Typography color="text.secondary" sx={{ maxWidth: 420 }}>
        There’s nothing at this address. It may have moved, or the link may have a typo.
      </Typography>
      <Button component={RouterLink} to="/" variant="contained" size="large">
        Go to Home
      </Button>
    </Box>
  );
}
