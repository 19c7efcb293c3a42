import type { Account, RunningFeeding } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { RiseChart } from '@/components/charts/rise-chart';
import { formatClock } from '@/lib/format/duration';

const hoursSince = (from: string, to: string) => (new Date(to).getTime() - new Date(from).getTime()) / 3_600_000;

/** The latest feeding's rise: readings, fitted curve, peak, in words under the chart. */
export function RunningRiseCard({ running, account, now }: { running: RunningFeeding; account: Account; now: Date }) {
  const { feeding, readings, fittedCurve, peakAt, riseMultiple } = running;
  const peakHours = peakAt ? hoursSince(feeding.fedAt, peakAt) : null;
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          This feeding’s rise
        </Typography>
        {readings.length === 0 ? (
          <Typography color="text.secondary">
            {feeding.initialHeightMm === null
              ? 'Add the jar’s starting height to a feeding to see its rise as a curve.'
              : 'No rise checks yet. Measure the jar every hour or two; after three the curve appears.'}
          </Typography>
        ) : (
          <div data-testid="rise-chart">
            <RiseChart
              readings={readings}
              curve={fittedCurve}
              peakHours={peakHours}
              label="Rise since the last feeding: rise checks as points, fitted curve as a line"
            />
          </div>
        )}
        {peakAt && (
          <Typography sx={{ mt: 1 }}>
            {running.riseStatus === 'peaked' ? 'Peaked' : 'Fitted peak'} at {formatClock(peakAt, account.timeZone, now)}
            {riseMultiple !== null ? `, at ${riseMultiple.toFixed(1)} × its starting height` : ''}.
          </Typography>
        )}
        {running.riseStatus === 'insufficient-data' && readings.length > 0 && (
          <Typography color="text.secondary" sx={{ mt: 1 }}>
            A few more rise checks and the curve can be fitted.
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}
