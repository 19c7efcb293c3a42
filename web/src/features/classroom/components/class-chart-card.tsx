import type { Account } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { LineChart } from '@mui/x-charts/LineChart';
import { formatTemperature, REFERENCE_TEMPERATURE_C } from '@peakwise/shared';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { useProgress } from '../api/get-progress';
import { progressChart, weekLabel, weekTicks } from '../utils/progress-chart';
import { hoursText } from '../utils/roster-words';

// Our palette first (slate, amber, crust, grey-teal), then further colours far enough apart to tell a
// dozen lines apart.
const COLOURS = ['#2F4858', '#C9832E', '#8A5518', '#6F8F8A', '#7A5C8E', '#4F7A3A', '#B5523B', '#3E7CB1'];

const changeWords = (change: number | null) => {
  if (change === null || Math.abs(change) < 0.25) return change === null ? '' : ', about the same as at first';
  return change > 0
    ? `, ${change.toFixed(1)} h slower than at first`
    : `, ${(-change).toFixed(1)} h faster than at first`;
};

/** Each student culture's time to peak at the reference over the weeks: rising lines are slowing starters. */
export function ClassChartCard({
  classId,
  startsOn,
  account,
}: {
  classId: string;
  startsOn: string;
  account: Account;
}) {
  const progress = useProgress(classId);
  const chart = useMemo(
    () => (progress.data ? progressChart(progress.data.series, startsOn) : null),
    [progress.data, startsOn],
  );
  const ticks = chart ? weekTicks(chart.grid) : [];
  const reference = `${formatTemperature(REFERENCE_TEMPERATURE_C, account.temperatureUnit)}, 1:1:1`;

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Time to peak over the weeks
        </Typography>
        <Typography color="text.secondary">
          Each culture’s time to peak as if fed 1:1:1 at{' '}
          {formatTemperature(REFERENCE_TEMPERATURE_C, account.temperatureUnit)}, so kitchens and ratios compare. A line
          that climbs is a starter slowing down.
        </Typography>
        {progress.isError && <LoadError error={progress.error} onRetry={() => void progress.refetch()} />}
        {chart && chart.lines.length === 0 && (
          <Typography color="text.secondary" sx={{ mt: 2 }}>
            Nothing to draw yet: the chart fills in as students log feedings with rise checks.
          </Typography>
        )}
        {chart && chart.lines.length > 0 && (
          <>
            <div data-testid="class-chart">
              <LineChart
                height={280}
                skipAnimation
                hideLegend
                aria-label={`Time to peak at ${reference}, in hours, of each student culture over the weeks of the class`}
                xAxis={[
                  {
                    data: chart.grid,
                    scaleType: 'linear',
                    min: 0,
                    max: ticks.at(-1),
                    tickInterval: ticks,
                    label: 'weeks since the class started',
                    valueFormatter: (v: number, context) => (context.location === 'tick' ? String(v) : weekLabel(v)),
                  },
                ]}
                yAxis={[{ min: 0, label: `hours to peak at ${reference}` }]}
                series={chart.lines.map((line, i) => ({
                  id: line.id,
                  label: line.label,
                  data: line.data,
                  color: COLOURS[i % COLOURS.length],
                  connectNulls: true,
                  showMark: true,
                  valueFormatter: (v: number | null) => (v === null ? '' : `${v.toFixed(1)} h`),
                }))}
              />
            </div>
            <Box component="ul" aria-label="Legend" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 0.5 }}>
              {chart.lines.map((line, i) => (
                <Box component="li" key={line.id} sx={{ display: 'flex', alignItems: 'center', gap: 1 }}>
                  <Box
                    aria-hidden
                    sx={{ width: 14, height: 4, borderRadius: 1, flexShrink: 0, bgcolor: COLOURS[i % COLOURS.length] }}
                  />
                  <Typography variant="body2">
                    <Link component={RouterLink} to={`/classes/${classId}/cultures/${line.cultureId}`}>
                      {line.label}
                    </Link>
                    : latest {hoursText(line.latest)}
                    {changeWords(line.change)}
                  </Typography>
                </Box>
              ))}
            </Box>
          </>
        )}
      </CardContent>
    </Card>
  );
}
