import type { Account, Feeding, RiseCheck } from '@peakwise/shared';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { formatHeight, heightUnit } from '@/lib/format/units';
import { mapServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateRiseCheck } from '../api/create-rise-check';
import { MODE_FIELD, toRiseCheckRequest, type RiseCheckValues, type RiseMode } from '../utils/rise-check-request';
import { bigToggleSx } from '@/components/logbook/toggle-sx';

interface RiseCheckFormProps {
  feeding: Feeding;
  account: Account;
  defaultTakenAt: string;
  /** With the stored rise check, or undefined when it waits in the outbox (no signal). */
  onSaved: (saved: RiseCheck | undefined) => void;
}

/** One number and save: the jar's height now (or its % rise, or × the initial height). */
export function RiseCheckForm({ feeding, account, defaultTakenAt, onSaved }: RiseCheckFormProps) {
  const create = useCreateRiseCheck(feeding.id);
  const idempotency = useIdempotencyKey();
  const { control, handleSubmit, setError, formState } = useForm<RiseCheckValues>({
    defaultValues: { mode: 'height', value: '', temperature: '', takenAt: defaultTakenAt },
  });
  const mode = useWatch({ control, name: 'mode' });
  const relative = feeding.initialHeightMm !== null;
  const units: Record<RiseMode, string> = { height: heightUnit(account.unitSystem), risePct: '%', multiple: '×' };
  const labels: Record<RiseMode, string> = {
    height: 'Height from the jar’s base',
    risePct: 'Rise above the start',
    multiple: 'Times the starting height',
  };

  const onSubmit = handleSubmit(async (values) => {
    const body = toRiseCheckRequest(values, account, values.takenAt !== defaultTakenAt);
    if (!body) {
      setError('value', { type: 'required', message: 'Enter one number.' }, { shouldFocus: true });
      return;
    }
    try {
      const saved = await create.mutateAsync({ body, headers: idempotency.headers() });
      idempotency.settle();
      onSaved(saved);
    } catch (error) {
      idempotency.settle(error);
      const { fieldErrors, formMessage } = mapServerErrors(error, [MODE_FIELD[values.mode], 'temperatureC', 'takenAt']);
      for (const { field, message } of fieldErrors) {
        const name = field === 'temperatureC' ? 'temperature' : field === 'takenAt' ? 'takenAt' : 'value';
        setError(name, { type: 'server', message }, { shouldFocus: true });
      }
      if (formMessage !== null) setError('root.server', { type: 'server', message: formMessage });
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <Controller
        control={control}
        name="mode"
        render={({ field }) => (
          <ToggleButtonGroup
            exclusive
            fullWidth
            color="primary"
            aria-label="How you measure"
            value={field.value}
            onChange={(_, v: RiseMode | null) => v && field.onChange(v)}
          >
            <ToggleButton value="height" sx={bigToggleSx}>
              {units.height}
            </ToggleButton>
            <ToggleButton value="risePct" disabled={!relative} sx={bigToggleSx}>
              % rise
            </ToggleButton>
            <ToggleButton value="multiple" disabled={!relative} sx={bigToggleSx}>
              × initial
            </ToggleButton>
          </ToggleButtonGroup>
        )}
      />
      <FormTextField
        control={control}
        name="value"
        label={labels[mode]}
        autoFocus
        helperText={
          feeding.initialHeightMm !== null
            ? `It started at ${formatHeight(feeding.initialHeightMm, account.unitSystem)}.`
            : 'Add the starting height to the feeding to use % rise or × initial.'
        }
        slotProps={{
          input: { endAdornment: <InputAdornment position="end">{units[mode]}</InputAdornment> },
          htmlInput: { inputMode: 'decimal', style: { fontSize: '1.5rem' } },
        }}
      />
      <Typography variant="body2" color="text.secondary">
        Optional
      </Typography>
      <Stack spacing={2}>
        <FormTextField
          control={control}
          name="temperature"
          label="Temperature now"
          slotProps={{
            input: { endAdornment: <InputAdornment position="end">°{account.temperatureUnit}</InputAdornment> },
            htmlInput: { inputMode: 'decimal' },
          }}
        />
        <FormTextField
          control={control}
          name="takenAt"
          label="Taken at"
          type="datetime-local"
          slotProps={{ inputLabel: { shrink: true } }}
        />
      </Stack>
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={bigToggleSx}>
        Save rise check
      </Button>
    </Stack>
  );
}
