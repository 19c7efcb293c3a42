import type { PlanStep, TemperatureUnit } from '@peakwise/shared';
import CheckCircle from '@mui/icons-material/CheckCircle';
import NightsStayOutlined from '@mui/icons-material/NightsStayOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { formatRange, formatTime, formatWhen, type ClockOptions } from '../utils/clock';
import { CAUTION_LABEL, cautionText } from '../utils/cautions';
import { stepTitle, temperatureRole, uncertaintyWords } from '../utils/step-words';
import { formatTemperature } from '../utils/temperature';

interface Props {
  step: PlanStep;
  current: boolean;
  clock: ClockOptions;
  now: Date;
  unit: TemperatureUnit;
  /** Cautions spelled out in full here (the first time each shows, and on the current step). */
  fullCautions: Set<string>;
  /** The Done / Undo controls, when this row has them. */
  controls?: ReactNode;
}

function whenLine(step: PlanStep, clock: ClockOptions, now: Date): string | null {
  const u = step.uncertainty;
  if (step.done) {
    const end = Date.parse(step.endAt) - Date.parse(step.startAt) >= 60_000 ? `–${formatTime(step.endAt, clock)}` : '';
    return `Done at ${formatTime(step.startAt, clock)}${end}`;
  }
  if (u?.source === 'bake-time')
    return `Out of the oven between ${formatTime(u.low, clock)} and ${formatTime(u.high, clock)}`;
  if (u) return `${uncertaintyWords(u.source)} about ${formatRange(step.endAt, u.low, u.high, clock)}`;
  const minutes = (Date.parse(step.endAt) - Date.parse(step.startAt)) / 60_000;
  if (minutes < 1) return null;
  return step.action
    ? `${formatTime(step.startAt, clock)}–${formatTime(step.endAt, clock)}`
    : `until ${formatWhen(step.endAt, now, clock)}`;
}

/** One step of the live timeline: time, a dot on the rail (filled = hands-on), what to do. */
export function StepRow({ step, current, clock, now, unit, fullCautions, controls }: Props) {
  const quiet = step.inQuietHours && !step.done;
  const muted = !step.action || step.done;
  const when = whenLine(step, clock, now);
  return (
    <Box
      component="li"
      data-testid="plan-step"
      data-step={step.id}
      data-done={step.done ? 'true' : 'false'}
      aria-current={current ? 'step' : undefined}
      sx={{
        display: 'grid',
        gridTemplateColumns: '4.5rem 20px 1fr',
        columnGap: 1,
        py: current ? 1.5 : 1,
        px: current ? 1 : 0,
        mx: current ? -1 : 0,
        borderRadius: 2,
        bgcolor: current ? 'rgba(201, 131, 46, 0.12)' : undefined,
      }}
    >
      <Typography
        variant="body2"
        sx={{
          fontVariantNumeric: 'tabular-nums',
          textAlign: 'right',
          pt: 0.25,
          fontWeight: step.action ? 500 : 400,
          color: muted ? 'text.secondary' : 'text.primary',
        }}
      >
        {formatTime(step.startAt, clock)}
      </Typography>
      <Box sx={{ display: 'flex', justifyContent: 'center', pt: 0.5 }} aria-hidden>
        {step.done ? (
          <CheckCircle sx={{ fontSize: 18, color: 'success.main' }} />
        ) : (
          <Box
            sx={{
              width: step.action ? 14 : 10,
              height: step.action ? 14 : 10,
              mt: step.action ? 0.25 : 0.5,
              borderRadius: '50%',
              border: 2,
              borderColor: quiet ? 'error.main' : current ? 'secondary.dark' : 'primary.main',
              bgcolor: step.action ? (current ? 'secondary.main' : 'primary.main') : 'background.paper',
            }}
          />
        )}
      </Box>
      <Stack spacing={0.5} sx={{ minWidth: 0 }}>
        <Typography
          sx={{
            fontWeight: step.action ? 500 : 400,
            fontSize: current ? '1.125rem' : undefined,
            color: muted ? 'text.secondary' : 'text.primary',
          }}
        >
          {stepTitle(step)}
          {!step.action && !step.done && (
            <Typography component="span" variant="body2" color="text.secondary">
              {' '}
              · waiting
            </Typography>
          )}
        </Typography>
        {when && (
          <Typography variant="body2" color="text.secondary">
            {when}
            {step.temperatureC !== undefined &&
              ` · ${temperatureRole(step.kind)} ${formatTemperature(step.temperatureC, unit)}`}
          </Typography>
        )}
        {!when && step.temperatureC !== undefined && (
          <Typography variant="body2" color="text.secondary">
            {temperatureRole(step.kind)} {formatTemperature(step.temperatureC, unit)}
          </Typography>
        )}
        {quiet && (
          <Chip
            size="small"
            color="error"
            variant="outlined"
            icon={<NightsStayOutlined />}
            label="In your quiet hours"
            sx={{ alignSelf: 'flex-start' }}
          />
        )}
        {!step.done &&
          step.cautions.map((c) =>
            fullCautions.has(c) || current ? (
              <Typography key={c} variant="body2" sx={{ display: 'flex', gap: 0.5, color: 'secondary.dark' }}>
                <WarningAmberOutlined sx={{ fontSize: 18, mt: 0.1 }} aria-hidden />
                <span>{cautionText(c)}</span>
              </Typography>
            ) : (
              <Typography key={c} variant="caption" sx={{ display: 'flex', gap: 0.5, color: 'secondary.dark' }}>
                <WarningAmberOutlined sx={{ fontSize: 14 }} aria-hidden />
                {CAUTION_LABEL[c]} (see above)
              </Typography>
            ),
          )}
        {controls}
      </Stack>
    </Box>
  );
}
