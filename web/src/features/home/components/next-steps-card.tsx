import type { Account } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';

const UNIT_NAMES = { metric: 'metric units', us: 'US units' } as const;

/** What the baker can do today, and honestly what is still being built. */
export function NextStepsCard({ account }: { account: Account }) {
  return (
    <Card sx={{ borderColor: 'secondary.main', bgcolor: 'rgba(201, 131, 46, 0.07)' }}>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          What comes next
        </Typography>
        <Typography sx={{ mb: 1.5 }}>
          Your cultures live on the Shelf: add one, log its feedings and rise checks, and see when it will be ready.
        </Typography>
        <Typography>
          Until then, check that Peakwise speaks your kitchen’s language. You’re set to{' '}
          <strong>{UNIT_NAMES[account.unitSystem]}</strong>, <strong>°{account.temperatureUnit}</strong> and the{' '}
          <strong>{account.timeZone.replaceAll('_', ' ')}</strong> time zone, which every forecast and reminder will
          use.
        </Typography>
      </CardContent>
      <CardActions sx={{ px: 2, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        <Button component={RouterLink} to="/shelf" variant="contained" size="large">
          Go to your Shelf
        </Button>
        <Button component={RouterLink} to="/account" variant="outlined">
          Check units and time zone
        </Button>
      </CardActions>
    </Card>
  );
}
