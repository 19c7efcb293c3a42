import type { Account, FeedingListQuery, FeedingListResponse, RiseCheckListResponse } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import {
  ChartsContainer,
  ChartsTooltip,
  ChartsXAxis,
  ChartsYAxis,
  LinePlot,
  ScatterPlot,
  type AllSeriesType,
} from '@mui/x-charts';
import { useQueries, useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { getFeedings } from '@/lib/logbook/get-feedings';
import { getRiseChecks, riseChecksQueryOptions } from '@/lib/logbook/get-rise-checks';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { riseOverlay } from '../utils/rise-overlay';

// Newest first: slate, amber, crust, a grey-teal; the newest reads strongest.
const COLOURS = ['#2F4858', '#C9832E', '#8A5518', '#6F8F8A'];
const FEEDINGS_SHOWN = 4;

type Fetch<T> = { queryKey: readonly unknown[]; queryFn: () => Promise<T> };
/** Where the feedings and rise checks come from when they are not the baker's own (a class's read-only routes). */
export interface RiseOverlaySource {
  feedings: (query: FeedingListQuery) => Fetch<FeedingListResponse>;
  riseChecks: (feedingId: string) => Fetch<RiseCheckListResponse>;
}

/** The last few feedings' rises overlaid: rise checks as points, fitted curves as lines, peaks marked. */
export function RiseOverlayCard({
  cultureId,
  account,
  source,
}: {
  cultureId: string;
  account: Account;
  source?: RiseOverlaySource;
}) {
  const query = { limit: FEEDINGS_SHOWN, order: 'desc' } as const;
  const feedings = useQuery(
    source?.feedings(query) ?? {
      queryKey: logbookKeys.feedings(cultureId, { ...query }),
      queryFn: () => getFeedings(cultureId, query),
    },
  );
  const items = useMemo(() => feedings.data?.items ?? [], [feedings.data]);
  // combine keeps one array per set of results, so the fits below rerun only when data changes.
  const checks = useQueries({
    queries: items.map(
      (f): Fetch<RiseCheckListResponse> =>
        source?.riseChecks(f.id) ?? {
          queryKey: riseChecksQueryOptions(f.id).queryKey,
          queryFn: () => getRiseChecks(f.id),
        },
    ),
    combine: (results) => (results.every((r) => r.isSuccess) ? results.map((r) => r.data.items) : null),
  });
  const overlay = useMemo(
    () =>
      checks
        ? riseOverlay(items.map((feeding, i) => ({ feeding, checks: checks[i] ?? [] })))
        : { grid: [], series: [] },
    [items, checks],
  );
  if (overlay.series.length < 2) return null;

  const label = (iso: string) =>
    new Date(iso).toLocaleString('en-GB', { timeZone: account.timeZone, dateStyle: 'medium', timeStyle: 'short' });
  const series: AllSeriesType[] = overlay.series.flatMap((s, i) => {
    const colour = COLOURS[i % COLOURS.length]!;
    const peakIndex = s.peakHours === null ? -1 : overlay.grid.findIndex((t) => t >= s.peakHours!);
    const peakY = peakIndex >= 0 ? s.curve[peakIndex] : null;
    const out: AllSeriesType[] = [
      {
        type: 'line',
        id: `fit-${s.feedingId}`,
        label: `Fed ${label(s.fedAt)}`,
        color: colour,
        showMark: false,
        data: s.curve,
        connectNulls: false,
      },
      {
        type: 'scatter',
        id: `checks-${s.feedingId}`,
        label: `Rise checks, fed ${label(s.fedAt)}`,
        color: colour,
        markerSize: 4,
        data: s.readings.map((r, j) => ({ id: j, x: r.hours, y: r.multiple })),
      },
    ];
    if (peakY !== null && peakY !== undefined && s.peakHours !== null) {
      out.push({
        type: 'scatter',
        id: `peak-${s.feedingId}`,
        label: `Peak, fed ${label(s.fedAt)}`,
        color: colour,
        markerSize: 9,
        data: [{ id: 0, x: s.peakHours, y: peakY }],
      });
    }
    return out;
  });

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Last feedings compared
        </Typography>
        <Typography color="text.secondary">
          Each rise from its own feeding time: points are rise checks, lines the fitted curves, the big dot each peak.
        </Typography>
        <div data-testid="rise-overlay">
          <ChartsContainer
            height={260}
            series={series}
            xAxis={[{ id: 'h', data: overlay.grid, scaleType: 'linear', min: 0, label: 'hours since feeding' }]}
            yAxis={[{ id: 'm', label: '× initial height' }]}
            skipAnimation
            aria-label="Rise curves of the last feedings overlaid"
            role="img"
          >
            <LinePlot />
            <ScatterPlot />
            <ChartsXAxis axisId="h" />
            <ChartsYAxis axisId="m" />
            <ChartsTooltip trigger="item" />
          </ChartsContainer>
        </div>
        <Stack direction="row" sx={{ flexWrap: 'wrap', columnGap: 2, rowGap: 0.5 }}>
          {overlay.series.map((s, i) => (
            <Stack key={s.feedingId} direction="row" spacing={0.75} sx={{ alignItems: 'center' }}>
              <Box sx={{ width: 12, height: 12, borderRadius: '50%', bgcolor: COLOURS[i % COLOURS.length] }} />
              <Typography variant="body2">
                {i === 0 ? 'Latest, ' : ''}fed {label(s.fedAt)}
              </Typography>
            </Stack>
          ))}
        </Stack>
      </CardContent>
    </Card>
  );
}
