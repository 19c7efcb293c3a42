import type { Account, BakePlanView } from '@peakwise/shared';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { FormAlert } from '@/components/form/form-alert';
import { parseNumber, temperatureFromInput } from '@/lib/format/units';
import { mapServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateReading, useDeleteReading } from '../api/plan-writes';
import { formatRange, formatWhen, type ClockOptions } from '../utils/clock';
import { formatTemperature } from '../utils/temperature';

interface Props {
  plan: BakePlanView;
  account: Account;
  clock: ClockOptions;
  now: Date;
  active: boolean;
}

function estimateWords(plan: BakePlanView, clock: ClockOptions, now: Date): string {
  const { bulk } = plan.live;
  if (bulk.status === 'done') return 'Bulk is done: the dough has reached its rise.';
  if (bulk.status === 'not-reached' || !bulk.endAt) return 'Bulk begins when you mix; the estimate starts then.';
  const when =
    bulk.low && bulk.high ? formatRange(bulk.endAt, bulk.low, bulk.high, clock) : formatWhen(bulk.endAt, now, clock);
  return `Bulk ends about ${when}.`;
}

/** What the estimate rests on: temperatures (planned, measured, the kitchen's) and the jar. */
function basisWords(plan: BakePlanView, unit: Account['temperatureUnit']): string {
  const measured = plan.readings.some((r) => r.temperatureC !== null);
  const jar = plan.live.bulk.readingsUsed;
  if (!measured && !plan.kitchen && jar === 0) {
    const planned = plan.live.timing.doughTemperatureC ?? plan.settings.doughTemperatureC;
    return `No readings yet: estimated at the planned dough temperature (${formatTemperature(planned, unit)}).`;
  }
  const temperatures = plan.kitchen
    ? `the kitchen logger’s room temperatures${measured ? ' and your dough temperatures' : ''}`
    : measured
      ? 'your dough temperatures'
      : null;
  const jarWords = jar > 0 ? `${jar} ${jar === 1 ? 'reading' : 'readings'} of the jar’s rise` : null;
  return `Estimated from ${[temperatures, jarWords].filter(Boolean).join(' and ')}.`;
}

/** The bulk estimate, what it rests on, and the dough readings that move it. */
export function BulkCard({ plan, account, clock, now, active }: Props) {
  const create = useCreateReading(plan.id);
  const remove = useDeleteReading(plan.id);
  const key = useIdempotencyKey();
  const [temperature, setTemperature] = useState('');
  const [rise, setRise] = useState('');
  const [error, setError] = useState<string | null>(null);
  const { bulk } = plan.live;
  const tUnit = account.temperatureUnit;
  const pace = bulk.readingsUsed > 0 && Math.abs(bulk.rateScale - 1) >= 0.05;

  const onLog = async () => {
    const t = parseNumber(temperature);
    const r = parseNumber(rise);
    if (t === null && r === null) {
      setError('Enter the dough temperature, the jar’s rise, or both.');
      return;
    }
    setError(null);
    try {
      await create.mutateAsync({
        body: {
          takenAt: new Date().toISOString(),
          ...(t === null ? {} : { temperatureC: temperatureFromInput(t, tUnit) }),
          ...(r === null ? {} : { risePct: r }),
        },
        headers: key.headers(),
      });
      key.settle();
      setTemperature('');
      setRise('');
    } catch (e) {
      key.settle(e);
      const { fieldErrors, formMessage } = mapServerErrors(e, ['temperatureC', 'risePct', 'takenAt']);
      setError([...fieldErrors.map((f) => f.message), formMessage].filter(Boolean).join(' '));
    }
  };

  return (
    <Card component="section" aria-labelledby="bulk-heading" data-testid="bulk-card">
      <CardContent>
        <Stack spacing={1.5}>
          <Typography variant="h3" component="h2" id="bulk-heading">
            Bulk fermentation
          </Typography>
          <Typography sx={{ fontWeight: 500 }}>{estimateWords(plan, clock, now)}</Typography>
          <Typography variant="body2" color="text.secondary">
            {basisWords(plan, tUnit)}
            {pace && ` The dough is rising ${bulk.rateScale.toFixed(1)}× as fast as expected.`}
            {bulk.low && bulk.high && ' The range is where 8 in 10 bulks like this end.'}
          </Typography>
          {active && (
            <>
              <Stack direction="row" spacing={1}>
                <TextField
                  label="Temperature"
                  helperText="Of the dough"
                  value={temperature}
                  onChange={(e) => setTemperature(e.target.value)}
                  slotProps={{
                    htmlInput: { inputMode: 'decimal' },
                    input: { endAdornment: <InputAdornment position="end">°{tUnit}</InputAdornment> },
                  }}
                />
                <TextField
                  label="Jar rise"
                  value={rise}
                  onChange={(e) => setRise(e.target.value)}
                  helperText="Aliquot jar, since mixing"
                  slotProps={{
                    htmlInput: { inputMode: 'decimal' },
                    input: { endAdornment: <InputAdornment position="end">%</InputAdornment> },
                  }}
                />
              </Stack>
              <FormAlert message={error ?? undefined} />
              <Button variant="outlined" size="large" loading={create.isPending} onClick={() => void onLog()}>
                Log reading now
              </Button>
            </>
          )}
          {plan.readings.length > 0 && (
            <Stack component="ul" spacing={0.5} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Dough readings">
              {[...plan.readings]
                .sort((a, b) => Date.parse(b.takenAt) - Date.parse(a.takenAt))
                .map((r) => (
                  <Stack
                    component="li"
                    key={r.id}
                    direction="row"
                    sx={{ alignItems: 'center' }}
                    data-testid="dough-reading"
                  >
                    <Typography variant="body2" sx={{ flex: 1 }}>
                      {formatWhen(r.takenAt, now, clock)}
                      {r.temperatureC !== null && ` · ${formatTemperature(r.temperatureC, tUnit)}`}
                      {r.risePct !== null && ` · jar +${Math.round(r.risePct)} %`}
                    </Typography>
                    {active && (
                      <IconButton
                        aria-label={`Delete the reading of ${formatWhen(r.takenAt, now, clock)}`}
                        disabled={remove.isPending}
                        onClick={() => remove.mutate(r.id)}
                      >
                        <DeleteOutline />
                      </IconButton>
                    )}
                  </Stack>
                ))}
            </Stack>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
