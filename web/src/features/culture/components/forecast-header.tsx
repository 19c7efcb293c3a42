import type { Account, CultureSummary } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { LogbookActions } from '@/components/logbook/logbook-actions';
import { StateChip } from '@/components/logbook/state-chip';
import { formatAgo, formatClock } from '@/lib/format/duration';
import { forecastWords, readyWindowOf } from '@/lib/logbook/forecast-words';

interface ForecastHeaderProps {
  cultureId: string;
  summary: CultureSummary | undefined;
  summaryFailed: boolean;
  lastFedAt: string | null;
  account: Account;
  now: Date;
  /** Another's culture shown read-only (a class's instructor): no Log feeding or Rise check buttons. */
  readOnly?: boolean;
}

/** State, countdown with its interval and the two big actions. */
export function ForecastHeader({
  cultureId,
  summary,
  summaryFailed,
  lastFedAt,
  account,
  now,
  readOnly = false,
}: ForecastHeaderProps) {
  const words = summary ? forecastWords(summary, now) : null;
  const window = summary ? readyWindowOf(summary) : null;
  return (
    <Card sx={{ borderColor: 'secondary.main' }}>
      <CardContent>
        <Stack spacing={1}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            {summary && <StateChip state={summary.state} />}
            <Typography color="text.secondary">
              {lastFedAt ? `Fed ${formatAgo(lastFedAt, now)}` : 'Not fed yet'}
            </Typography>
          </Stack>
          {words?.countdown && (
            <Typography variant="h2" component="p" data-testid="forecast">
              {words.countdown.charAt(0).toUpperCase() + words.countdown.slice(1)}
            </Typography>
          )}
          {window && (
            <Typography>
              Peak expected around {formatClock(window.at, account.timeZone, now)} (between{' '}
              {formatClock(window.low, account.timeZone, now)} and {formatClock(window.high, account.timeZone, now)}, 4
              times in 5).
            </Typography>
          )}
          {words?.basis && <Typography color="text.secondary">Estimated {words.basis}.</Typography>}
          {summaryFailed && lastFedAt && <Typography color="text.secondary">Prediction not available yet.</Typography>}
          {summary?.caution && <Alert severity="error">{summary.caution}</Alert>}
        </Stack>
        {!readOnly && (
          <Stack direction="row" spacing={1} sx={{ mt: 2 }}>
            <LogbookActions cultureId={cultureId} lastFedAt={lastFedAt} />
          </Stack>
        )}
      </CardContent>
    </Card>
  );
}
