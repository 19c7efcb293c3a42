import type { Account, BakePlan, PlanOption, PlanOptionKind } from '@peakwise/shared';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import ErrorOutline from '@mui/icons-material/ErrorOutlineOutlined';
import ExpandMore from '@mui/icons-material/ExpandMore';
import ThermostatOutlined from '@mui/icons-material/ThermostatOutlined';
import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { formatWhen, type ClockOptions } from '../utils/clock';
import { formatSpot } from '../utils/temperature';
import { OptionTimeline } from './option-timeline';

export type Choice = { option: PlanOptionKind; useTemperatureLever: boolean };

const OPTION_TITLE: Record<PlanOptionKind, string> = {
  'same-day': 'Same day',
  'overnight-retard': 'Overnight in the fridge',
};

interface Props {
  plan: BakePlan;
  account: Account;
  clock: ClockOptions;
  now: Date;
  basis: 'culture' | 'default';
  onChoose: (choice: Choice) => void;
  choosing: Choice | null;
}

function OptionCard(props: {
  title: string;
  testId: string;
  option: PlanOption;
  badge?: ReactNode;
  intro?: ReactNode;
  clock: ClockOptions;
  now: Date;
  choose: ReactNode;
}) {
  const { option, clock, now } = props;
  // An option that does not fit keeps its nearest attempt folded away: the reason says enough.
  const [showAttempt, setShowAttempt] = useState(false);
  return (
    <Card
      data-testid={props.testId}
      sx={{ borderColor: option.fits ? 'primary.main' : 'divider', opacity: option.fits ? 1 : 0.85 }}
    >
      <CardContent>
        <Stack spacing={1.5}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
            <Typography variant="h3" component="h3">
              {props.title}
            </Typography>
            {props.badge}
          </Stack>
          {props.intro}
          {option.fits ? (
            <Typography sx={{ display: 'flex', gap: 0.5, alignItems: 'center' }}>
              <CheckCircleOutlined color="success" fontSize="small" aria-hidden />
              Fits{option.readyAt ? ` — ready ${formatWhen(option.readyAt, now, clock)}` : ''}
            </Typography>
          ) : (
            <Typography color="error" sx={{ display: 'flex', gap: 0.5, alignItems: 'flex-start' }}>
              <ErrorOutline fontSize="small" aria-hidden sx={{ mt: 0.25 }} />
              Does not fit: {option.reason ?? 'no times work with these settings.'}
            </Typography>
          )}
          {option.steps.length > 0 &&
            (option.fits || showAttempt ? (
              <OptionTimeline steps={option.steps} clock={clock} now={now} />
            ) : (
              <Button size="small" onClick={() => setShowAttempt(true)} sx={{ alignSelf: 'flex-start' }}>
                Show the times it would need
              </Button>
            ))}
          {option.warnings.map((w) => (
            <Alert key={w} severity="warning">
              {w.charAt(0).toUpperCase() + w.slice(1)}
            </Alert>
          ))}
          {option.fits && props.choose}
        </Stack>
      </CardContent>
    </Card>
  );
}

/**
 * The preview's options: what fits first (the recommended one leading), then the warmer or cooler
 * spot, then what does not fit; the assumptions last, folded.
 */
export function PlanOptions({ plan, account, clock, now, basis, onChoose, choosing }: Props) {
  const options = [...plan.options].sort(
    (a, b) => Number(b.kind === plan.recommended) - Number(a.kind === plan.recommended),
  );
  const fitting = options.filter((o) => o.fits);
  const notFitting = options.filter((o) => !o.fits);
  const lever = plan.temperatureLever;
  const busy = choosing !== null;
  const chooseButton = (choice: Choice, label: string) => (
    <Button
      variant="contained"
      size="large"
      disabled={busy}
      loading={choosing?.option === choice.option && choosing.useTemperatureLever === choice.useTemperatureLever}
      onClick={() => onChoose(choice)}
    >
      {label}
    </Button>
  );

  const optionCard = (o: PlanOption) => (
    <OptionCard
      key={o.kind}
      testId={`option-${o.kind}`}
      title={OPTION_TITLE[o.kind]}
      option={o}
      badge={o.kind === plan.recommended ? <Chip size="small" color="secondary" label="Recommended" /> : undefined}
      clock={clock}
      now={now}
      choose={chooseButton(
        { option: o.kind, useTemperatureLever: false },
        o.kind === 'same-day' ? 'Bake the same day' : 'Retard overnight',
      )}
    />
  );

  return (
    <Stack spacing={2} component="section" aria-labelledby="options-heading">
      <Typography variant="h2" id="options-heading">
        Your options
      </Typography>
      {basis === 'default' && (
        <Typography variant="body2" color="text.secondary">
          Timed with typical sourdough behaviour; a culture with a few logged feedings gives its own times.
        </Typography>
      )}
      {plan.recommended === null && !lever && (
        <Alert severity="info">
          Neither option fits. Try a later ready time, shorter quiet hours, or a warmer dough.
        </Alert>
      )}
      {fitting.map(optionCard)}
      {lever && (
        <OptionCard
          testId="option-lever"
          title={
            lever.doughTemperatureC > lever.currentDoughTemperatureC
              ? 'Same day, in a warmer spot'
              : 'Same day, in a cooler spot'
          }
          option={lever.option}
          badge={<ThermostatOutlined color="secondary" aria-hidden />}
          intro={
            <Typography>
              Put the dough somewhere near {formatSpot(lever.doughTemperatureC, account.temperatureUnit)} (instead of{' '}
              {formatSpot(lever.currentDoughTemperatureC, account.temperatureUnit)}) to finish bulk by{' '}
              {formatWhen(lever.bulkEndAt, now, clock)}.
            </Typography>
          }
          clock={clock}
          now={now}
          choose={chooseButton(
            { option: 'same-day', useTemperatureLever: true },
            `Bake the same day at ${formatSpot(lever.doughTemperatureC, account.temperatureUnit)}`,
          )}
        />
      )}
      {notFitting.map(optionCard)}
      {plan.assumptions.length > 0 && (
        <Accordion disableGutters variant="outlined">
          <AccordionSummary expandIcon={<ExpandMore />}>
            <Typography>What Peakwise assumed ({plan.assumptions.length})</Typography>
          </AccordionSummary>
          <AccordionDetails>
            <Stack component="ul" spacing={0.5} sx={{ m: 0, pl: 2.5 }}>
              {plan.assumptions.map((a) => (
                <Typography component="li" variant="body2" key={a}>
                  {a}
                </Typography>
              ))}
            </Stack>
          </AccordionDetails>
        </Accordion>
      )}
    </Stack>
  );
}
