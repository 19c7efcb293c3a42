import { celsiusToFahrenheit, type CultureKineticsSummary, type TemperatureUnit } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import {
  ChartsContainer,
  ChartsTooltip,
  ChartsXAxis,
  ChartsYAxis,
  LinePlot,
  ScatterPlot,
  type AllSeriesType,
} from '@mui/x-charts';
import { basisWords, kineticsSentence, trendWords } from '../utils/kinetics-words';

/** How this culture answers to temperature: the sentence, then time to peak against temperature. */
export function KineticsCard({
  kinetics,
  unit,
  whose = 'your',
}: {
  kinetics: CultureKineticsSummary;
  unit: TemperatureUnit;
  /** Whose feedings the dots are: "your", or "Dev Rowan’s" when an instructor reads a student's culture. */
  whose?: string;
}) {
  const theme = useTheme();
  const t = (c: number) => (unit === 'F' ? celsiusToFahrenheit(c) : c);
  const curve = [...kinetics.hoursToPeakAt].sort((a, b) => a.temperatureC - b.temperatureC);
  const series: AllSeriesType[] = [
    {
      type: 'line',
      id: 'model',
      label: 'This culture’s model (1:1:1)',
      color: theme.palette.primary.main,
      showMark: false,
      data: curve.map((p) => p.hours),
      valueFormatter: (v) => (v === null ? '' : `${v.toFixed(1)} h`),
    },
    {
      type: 'scatter',
      id: 'observed',
      label: `${whose.charAt(0).toUpperCase()}${whose.slice(1)} feedings`,
      color: theme.palette.secondary.dark,
      data: kinetics.observations.map((o, i) => ({ id: i, x: t(o.temperatureC), y: o.hoursToPeak })),
      valueFormatter: (v) => (v ? `${v.y.toFixed(1)} h at ${v.x.toFixed(0)} °${unit}` : ''),
    },
  ];
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          How it answers to temperature
        </Typography>
        <Typography sx={{ fontSize: '1.1rem' }} data-testid="kinetics-sentence">
          {kineticsSentence(kinetics, unit)}
        </Typography>
        <Typography color="text.secondary" sx={{ mt: 1 }}>
          {basisWords(kinetics)} {trendWords(kinetics)}
        </Typography>
        {curve.length > 1 && (
          <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
            The line is a 1:1:1 feeding at each temperature; the dots are {whose} finished feedings, at their own ratio.
          </Typography>
        )}
        {curve.length > 1 && (
          <ChartsContainer
            height={240}
            series={series}
            xAxis={[{ id: 't', data: curve.map((p) => t(p.temperatureC)), scaleType: 'linear', label: `°${unit}` }]}
            yAxis={[{ id: 'h', min: 0, label: 'hours to peak' }]}
            // Drawn at once: an animated line is half-drawn in a screenshot and jumpy on a slow phone.
            skipAnimation
            aria-label="Hours to peak against temperature"
            role="img"
          >
            <LinePlot />
            <ScatterPlot />
            <ChartsXAxis axisId="t" />
            <ChartsYAxis axisId="h" />
            <ChartsTooltip trigger="item" />
          </ChartsContainer>
        )}
      </CardContent>
    </Card>
  );
}
