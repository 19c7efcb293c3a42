import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import FormControlLabel from '@mui/material/FormControlLabel';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { FormTextField } from '@/components/form/form-text-field';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { formatGrams } from '../utils/format';
import {
  MIXING_METHODS,
  presetFriction,
  waterDefaults,
  waterFor,
  type MixingMethod,
  type WaterFormValues,
} from '../utils/water-temperature';
import { FrictionCalibration } from './friction-calibration';
import { ChoiceToggle } from './choice-toggle';

const decimal = { inputMode: 'decimal' as const };
const METHOD_CHOICES: { value: MixingMethod; label: string }[] = [
  ...MIXING_METHODS.map((m) => ({ value: m.id, label: m.label })),
  { value: 'own', label: 'Your own' },
];

/**
 * Desired dough temperature → the water temperature to mix with (3 factors, or 4 with a levain),
 * the friction factor from the mixing method or a past bake, and ice when the tap runs too warm.
 */
export function WaterTemperaturePage() {
  const { temperatureUnit: unit } = useSignedInAccount();
  const [params] = useSearchParams();
  const [defaults] = useState(() => waterDefaults(unit, params.get('waterG') ?? ''));
  const { control, setValue } = useForm<WaterFormValues>({ defaultValues: defaults });
  const values = useWatch({ control }) as WaterFormValues;
  const result = waterFor(values, unit);
  const deg = `°${unit}`;
  const end = (u: string) => ({ endAdornment: <InputAdornment position="end">{u}</InputAdornment> });
  const t = (name: keyof WaterFormValues, label: string, helperText?: string) => (
    <FormTextField
      control={control}
      name={name}
      label={label}
      helperText={helperText}
      slotProps={{ htmlInput: decimal, input: end(deg) }}
    />
  );
  const round = (x: number) => Math.round(x * 10) / 10;

  return (
    <Page title="Water temperature" intro="Pick the water that lands your dough at the temperature you want.">
      <Card>
        <CardContent>
          <Stack spacing={2}>
            {t('desired', 'Desired dough temperature')}
            <Stack direction="row" spacing={1}>
              {t('room', 'Room')}
              {t('flour', 'Flour')}
            </Stack>
            <Controller
              control={control}
              name="withPreferment"
              render={({ field }) => (
                <FormControlLabel
                  control={<Switch checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />}
                  label="The dough has a levain or preferment (4 factors)"
                />
              )}
            />
            {values.withPreferment && t('preferment', 'Levain or preferment')}
            <Box>
              <Typography variant="h3" component="h2" gutterBottom>
                Friction: how you mix
              </Typography>
              <Controller
                control={control}
                name="method"
                render={({ field }) => (
                  <ChoiceToggle
                    label="Mixing method"
                    value={field.value}
                    options={METHOD_CHOICES}
                    onChange={(v) => {
                      field.onChange(v);
                      const preset = presetFriction(v, unit);
                      if (preset !== null) setValue('friction', String(preset));
                    }}
                  />
                )}
              />
            </Box>
            {t('friction', 'Friction factor', 'How much mixing warms the dough (a difference, not a temperature)')}
          </Stack>
        </CardContent>
      </Card>

      <Card sx={{ bgcolor: 'primary.main', color: 'primary.contrastText' }}>
        <CardContent>
          <Typography>Water at</Typography>
          <Typography variant="h1" component="p" data-testid="water-temperature" sx={{ fontSize: '2.5rem' }}>
            {result ? `${round(result.water)} ${deg}` : '—'}
          </Typography>
          {result && (
            <Typography variant="body2">
              {result.factors} factors: {result.factors} × desired = {round(result.base)} {deg}, minus room, flour
              {result.factors === 4 ? ', levain' : ''} and friction.
            </Typography>
          )}
        </CardContent>
      </Card>
      {result?.warnings.map((w) => (
        <Alert key={w.code} severity={w.code === 'water-above-hand-safe' ? 'error' : 'warning'}>
          {w.message}
        </Alert>
      ))}

      <Card>
        <CardContent>
          <Stack spacing={2}>
            <Box>
              <Typography variant="h2">Tap too warm? Ice</Typography>
              <Typography variant="body2" color="text.secondary">
                Ice replaces part of the water gram for gram; stir until it has melted.
              </Typography>
            </Box>
            <Stack direction="row" spacing={1}>
              {t('tap', 'Tap water')}
              <FormTextField
                control={control}
                name="waterG"
                label="Water in the dough"
                slotProps={{ htmlInput: decimal, input: end('g') }}
              />
            </Stack>
            {result?.ice && (
              <Typography data-testid="ice" sx={{ fontWeight: 500 }}>
                {result.ice.iceG > 0
                  ? `${formatGrams(result.ice.iceG)} of ice + ${formatGrams(result.ice.tapWaterG)} of tap water`
                  : 'No ice needed: the tap is cool enough.'}
              </Typography>
            )}
            {result && !result.ice && values.tap !== '' && values.waterG !== '' && result.warnings.length === 0 && (
              <Typography color="text.secondary">
                No ice needed: the tap is at or below {round(result.water)} {deg}.
              </Typography>
            )}
          </Stack>
        </CardContent>
      </Card>

      <FrictionCalibration
        unit={unit}
        withPreferment={values.withPreferment}
        onUse={(friction) => {
          setValue('method', 'own');
          setValue('friction', String(round(friction)));
        }}
      />
      <Button component={RouterLink} to="/formulas" sx={{ alignSelf: 'flex-start' }}>
        Back to your formulas
      </Button>
    </Page>
  );
}
