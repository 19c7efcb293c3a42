import type { RisePoint } from '@peakwise/shared';
import { useTheme } from '@mui/material/styles';
import {
  ChartsContainer,
  ChartsReferenceLine,
  ChartsTooltip,
  ChartsXAxis,
  ChartsYAxis,
  LinePlot,
  ScatterPlot,
  type AllSeriesType,
} from '@mui/x-charts';

interface RiseChartProps {
  readings: RisePoint[];
  curve: RisePoint[] | null;
  /** Hours after feeding of the (fitted) peak, marked with a line. */
  peakHours?: number | null;
  height?: number;
  /** A sparkline for the Shelf card: no axes, no tooltip. */
  compact?: boolean;
  label: string;
}

/**
 * One feeding's rise: rise checks as points (× the initial height), the fitted curve as a line and
 * the peak as a vertical mark. The line's x values are the axis data; the points carry their own.
 */
export function RiseChart({ readings, curve, peakHours, height = 240, compact = false, label }: RiseChartProps) {
  const theme = useTheme();
  const xs = curve && curve.length > 0 ? curve.map((p) => p.hours) : readings.map((p) => p.hours);
  const ys = [...readings.map((p) => p.multiple), ...(curve ?? []).map((p) => p.multiple), 1];
  const series: AllSeriesType[] = [
    {
      type: 'scatter',
      id: 'readings',
      label: 'Rise checks',
      color: theme.palette.secondary.dark,
      markerSize: compact ? 3 : 5,
      data: readings.map((p, i) => ({ id: i, x: p.hours, y: p.multiple })),
      valueFormatter: (v) => (v ? `${v.y.toFixed(2)} × after ${v.x.toFixed(1)} h` : ''),
    },
  ];
  if (curve && curve.length > 0) {
    series.push({
      type: 'line',
      id: 'fit',
      label: 'Fitted curve',
      color: theme.palette.primary.main,
      showMark: false,
      curve: 'linear',
      data: curve.map((p) => p.multiple),
      valueFormatter: (v) => (v === null ? '' : `${v.toFixed(2)} ×`),
    });
  }
  return (
    <ChartsContainer
      height={height}
      series={series}
      xAxis={[
        {
          id: 'hours',
          data: xs,
          scaleType: 'linear',
          min: 0,
          label: compact ? undefined : 'hours since feeding',
          ...(compact ? { position: 'none' as const } : {}),
        },
      ]}
      yAxis={[
        {
          id: 'multiple',
          min: Math.min(1, ...ys) * 0.95,
          max: Math.max(...ys) * 1.05,
          label: compact ? undefined : '× initial height',
          ...(compact ? { position: 'none' as const } : {}),
        },
      ]}
      margin={compact ? { top: 4, bottom: 4, left: 4, right: 4 } : undefined}
      // Drawn at once: an animated line is half-drawn in a screenshot and jumpy on a slow phone.
      skipAnimation
      aria-label={label}
      role="img"
    >
      <LinePlot />
      <ScatterPlot />
      {peakHours !== null && peakHours !== undefined && (
        <ChartsReferenceLine
          x={peakHours}
          label={compact ? undefined : 'peak'}
          lineStyle={{ stroke: theme.palette.secondary.main, strokeDasharray: '4 3' }}
        />
      )}
      {!compact && <ChartsXAxis axisId="hours" />}
      {!compact && <ChartsYAxis axisId="multiple" />}
      {!compact && <ChartsTooltip trigger="item" />}
    </ChartsContainer>
  );
}
