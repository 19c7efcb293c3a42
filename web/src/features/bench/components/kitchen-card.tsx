import type { BakePlanView } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { isApiError } from '@/lib/api-client';
import { useClearKitchen } from '../api/kitchen-writes';
import { formatWhen, type ClockOptions } from '../utils/clock';

interface Props {
  plan: BakePlanView;
  clock: ClockOptions;
  now: Date;
  /** The owner's page: import and remove. An instructor's read-only page only reads. */
  editable: boolean;
}

/** The kitchen logger's series on this bake: what is there, and the way to add or remove it. */
export function KitchenCard({ plan, clock, now, editable }: Props) {
  const clear = useClearKitchen(plan.id);
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { kitchen } = plan;
  if (!kitchen && !editable) return null;

  const onClear = async () => {
    setError(null);
    try {
      await clear.mutateAsync();
      setConfirming(false);
    } catch (e) {
      setError(isApiError(e) ? e.message : 'That did not remove the readings. Try again.');
    }
  };

  return (
    <Card component="section" aria-labelledby="kitchen-heading" data-testid="kitchen-card">
      <CardContent>
        <Stack spacing={1.5}>
          <Typography id="kitchen-heading" variant="h3" component="h2">
            Kitchen logger
          </Typography>
          {kitchen ? (
            <Typography>
              {kitchen.count.toLocaleString('en-GB')} room {kitchen.count === 1 ? 'reading' : 'readings'} from{' '}
              {formatWhen(kitchen.firstAt, now, clock)} to {formatWhen(kitchen.lastAt, now, clock)}. The bulk forecast
              takes the dough as following the room
              {plan.readings.some((r) => r.temperatureC !== null)
                ? ', and your measured dough temperatures over it'
                : ''}
              .
            </Typography>
          ) : (
            <Typography color="text.secondary">
              A temperature logger in the kitchen? Import its CSV file and the bulk forecast follows the room instead of
              the planned dough temperature.
            </Typography>
          )}
          {error && <Alert severity="error">{error}</Alert>}
          {editable && !confirming && (
            <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
              <Button component={RouterLink} to={`/bench/${plan.id}/kitchen/import`} variant="outlined">
                {kitchen ? 'Import another file' : 'Import logger file'}
              </Button>
              {kitchen && (
                <Button color="error" onClick={() => setConfirming(true)}>
                  Remove readings
                </Button>
              )}
            </Stack>
          )}
          {editable && confirming && (
            <Alert
              severity="warning"
              action={
                <Stack direction="row" spacing={1}>
                  <Button color="inherit" size="small" onClick={() => setConfirming(false)}>
                    Keep
                  </Button>
                  <Button color="error" size="small" onClick={() => void onClear()} loading={clear.isPending}>
                    Remove
                  </Button>
                </Stack>
              }
            >
              Remove all {kitchen?.count} room readings from this bake?
            </Alert>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
