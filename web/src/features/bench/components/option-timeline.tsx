import type { PlanStep } from '@peakwise/shared';
import NightsStayOutlined from '@mui/icons-material/NightsStayOutlined';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { formatTime, formatWhen, type ClockOptions } from '../utils/clock';
import { stepTitle } from '../utils/step-words';
import { compactSteps } from '../utils/timeline';

interface Props {
  steps: PlanStep[];
  clock: ClockOptions;
  now: Date;
}

/** An option in short: clock times down the left, hands-on steps bold, waits lighter. */
export function OptionTimeline({ steps, clock, now }: Props) {
  return (
    <Box
      component="ol"
      sx={{
        listStyle: 'none',
        p: 0,
        m: 0,
        display: 'grid',
        gridTemplateColumns: 'auto 1fr',
        columnGap: 1.5,
        rowGap: 0.5,
      }}
    >
      {compactSteps(steps).map(({ step, sets, lastAt, quiet }) => {
        const title =
          sets && sets > 1
            ? `Stretch-and-fold × ${sets} (last ${formatTime(lastAt ?? step.startAt, clock)})`
            : stepTitle(step);
        return (
          <Box component="li" key={step.id} sx={{ display: 'contents' }} data-testid="option-step">
            <Typography
              component="span"
              variant="body2"
              sx={{
                fontVariantNumeric: 'tabular-nums',
                whiteSpace: 'nowrap',
                color: step.action ? 'text.primary' : 'text.secondary',
              }}
            >
              {formatWhen(step.startAt, now, clock)}
            </Typography>
            <Typography
              component="span"
              variant="body2"
              sx={{
                fontWeight: step.action ? 500 : 400,
                color: quiet ? 'error.main' : step.action ? 'text.primary' : 'text.secondary',
                fontStyle: step.action ? 'normal' : 'italic',
              }}
            >
              {title}
              {quiet && (
                <>
                  {' '}
                  <NightsStayOutlined sx={{ fontSize: 16, verticalAlign: 'text-bottom' }} aria-hidden /> in quiet hours
                </>
              )}
            </Typography>
          </Box>
        );
      })}
    </Box>
  );
}
