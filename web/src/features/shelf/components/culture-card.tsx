import type { Culture } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { LogbookActions } from '@/components/logbook/logbook-actions';
import { RiseChart } from '@/components/charts/rise-chart';
import { StateChip } from '@/components/logbook/state-chip';
import { formatAgo } from '@/lib/format/duration';
import { forecastWords } from '@/lib/logbook/forecast-words';
import { useCultureSummary } from '@/lib/logbook/get-culture-summary';
import { useNow } from '@/lib/use-now';

/** One culture at a glance: state, countdown with its interval, last fed, the running rise. */
export function CultureCard({ culture }: { culture: Culture }) {
  const summary = useCultureSummary(culture.id);
  const now = useNow();
  const lastFedAt = summary.data?.lastFedAt ?? culture.lastFedAt;
  const words = summary.data ? forecastWords(summary.data, now) : null;
  const running = summary.data?.running;

  return (
    <Card component="article" aria-label={culture.name} data-testid="culture-card">
      <CardActionArea component={RouterLink} to={`/cultures/${culture.id}`}>
        <CardContent>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
            <Typography variant="h2" component="h2">
              {culture.name}
            </Typography>
            {summary.data && <StateChip state={summary.data.state} />}
          </Stack>
          <Typography color="text.secondary" sx={{ mt: 0.5 }}>
            {lastFedAt ? `Fed ${formatAgo(lastFedAt, now)}` : 'Not fed yet'}
            {culture.location === 'fridge' ? ' · in the fridge' : ''}
          </Typography>
          {summary.isPending && <Skeleton variant="text" width="70%" />}
          {summary.isError && lastFedAt && (
            <Typography color="text.secondary" sx={{ mt: 1 }}>
              Prediction not available yet.
            </Typography>
          )}
          {words?.countdown && (
            <Typography sx={{ mt: 1, fontWeight: 500 }} data-testid="countdown">
              {words.countdown.charAt(0).toUpperCase() + words.countdown.slice(1)}
            </Typography>
          )}
          {summary.data?.caution && (
            <Typography color="error" sx={{ mt: 1 }}>
              {summary.data.caution}
            </Typography>
          )}
          {running && running.readings.length > 0 && (
            <Box sx={{ mt: 1 }} data-testid="sparkline">
              <RiseChart
                compact
                height={64}
                readings={running.readings}
                curve={running.fittedCurve}
                label={`Rise of ${culture.name} since the last feeding`}
              />
            </Box>
          )}
        </CardContent>
      </CardActionArea>
      <CardActions sx={{ px: 2, pb: 2, gap: 1 }}>
        <LogbookActions cultureId={culture.id} lastFedAt={lastFedAt} />
      </CardActions>
    </Card>
  );
}
