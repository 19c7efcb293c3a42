import type { BakePlanView, PlanStep, TemperatureUnit } from '@peakwise/shared';
import Undo from '@mui/icons-material/Undo';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import Typography from '@mui/material/Typography';
import { formatDay, formatTime, type ClockOptions } from '../utils/clock';
import { stepTitle } from '../utils/step-words';
import { lastDoneStep, timelineRows } from '../utils/timeline';
import { DoneControls } from './done-controls';
import { StepRow } from './step-row';

interface Props {
  plan: BakePlanView;
  clock: ClockOptions;
  now: Date;
  unit: TemperatureUnit;
  active: boolean;
  busyStep: string | null;
  onDone: (step: PlanStep, at?: string) => void;
  onUndo: (step: PlanStep) => void;
  /** Someone else's bake shown read-only (an instructor's view): the now-marker, no Done or Undo. */
  readOnly?: boolean;
}

/** The plan top to bottom with the now-marker; the current step carries "Done", the last done one "Undo". */
export function LiveTimeline({ plan, clock, now, unit, active, busyStep, onDone, onUndo, readOnly }: Props) {
  const steps = plan.live.steps;
  const undoable = active ? lastDoneStep(steps, plan.checked) : null;
  // Each caution in full where it first applies; later steps name it briefly.
  const seen = new Set<string>();
  const fullAt = new Map<string, Set<string>>();
  for (const s of steps) {
    if (s.done) continue;
    fullAt.set(s.id, new Set(s.cautions.filter((c) => !seen.has(c))));
    s.cautions.forEach((c) => seen.add(c));
  }

  return (
    <Box component="ol" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Steps">
      {timelineRows(steps, clock.timeZone, active ? now : undefined).map((row) => {
        if (row.type === 'day')
          return (
            <Box component="li" key={row.key} sx={{ pt: 1.5, pb: 0.5 }} aria-hidden>
              <Typography variant="overline" color="text.secondary">
                {formatDay(row.day, clock.timeZone)}
              </Typography>
            </Box>
          );
        if (row.type === 'now')
          return (
            <Box
              component="li"
              key={row.key}
              data-testid="now-marker"
              sx={{ display: 'flex', alignItems: 'center', gap: 1, py: 0.5 }}
            >
              <Typography
                variant="caption"
                sx={{ color: 'secondary.dark', fontWeight: 700, width: '4.5rem', textAlign: 'right' }}
              >
                now {formatTime(now.toISOString(), clock)}
              </Typography>
              <Divider sx={{ flex: 1, borderColor: 'secondary.main', borderBottomWidth: 2 }} />
            </Box>
          );
        const { step, current } = row;
        const controls =
          active && current ? (
            <DoneControls
              title={stepTitle(step)}
              timeZone={clock.timeZone}
              busy={busyStep === step.id}
              onDone={(at) => onDone(step, at)}
            />
          ) : undoable?.id === step.id ? (
            <Button
              size="small"
              startIcon={<Undo />}
              disabled={busyStep !== null}
              onClick={() => onUndo(step)}
              sx={{ alignSelf: 'flex-start' }}
            >
              Undo
            </Button>
          ) : undefined;
        return (
          <StepRow
            key={row.key}
            step={step}
            current={active && current}
            clock={clock}
            now={now}
            unit={unit}
            fullCautions={fullAt.get(step.id) ?? new Set()}
            controls={readOnly ? undefined : controls}
          />
        );
      })}
    </Box>
  );
}
