import type { Account, Culture, Feeding } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEffect, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { DISCOLOURATION_CAUTION } from '@/components/logbook/cautions';
import { ObservationChips } from '@/components/logbook/observation-chips';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { heightUnit } from '@/lib/format/units';
import { mapServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateFeeding } from '../api/create-feeding';
import {
  defaultsFrom,
  FEEDING_FIELD_OF,
  gramsText,
  toFeedingRequest,
  type FeedingFormValues,
} from '@/lib/logbook/feeding-form';
import { RatioField } from './ratio-field';

const unit = (u: string) => ({ input: { endAdornment: <InputAdornment position="end">{u}</InputAdornment> } });
const decimal = { inputMode: 'decimal' as const };

interface LogFeedingFormProps {
  culture: Culture;
  last: Feeding | undefined;
  account: Account;
  onSaved: (feeding: Feeding) => void;
}

export function LogFeedingForm({ culture, last, account, onSaved }: LogFeedingFormProps) {
  const create = useCreateFeeding(culture.id);
  const idempotency = useIdempotencyKey();
  const [now] = useState(() => new Date());
  const [defaults] = useState(() => defaultsFrom(last, culture, account, now));
  const { control, handleSubmit, setError, setValue, formState } = useForm<FeedingFormValues>({
    defaultValues: defaults,
  });
  const ratio = useWatch({ control, name: 'ratio' });
  const observations = useWatch({ control, name: 'observations' });
  const tUnit = `°${account.temperatureUnit}`;
  const hUnit = heightUnit(account.unitSystem);

  const totalG = useWatch({ control, name: 'totalG' });
  // A preset and a total fill the three grams (the same split the API would make).
  useEffect(() => {
    const grams = gramsText(ratio, totalG);
    if (!grams) return;
    setValue('starterG', grams.starterG);
    setValue('flourG', grams.flourG);
    setValue('waterG', grams.waterG);
  }, [ratio, totalG, setValue]);

  const onSubmit = handleSubmit(async (values) => {
    const body = toFeedingRequest(values, account, values.fedAt !== defaults.fedAt);
    try {
      const feeding = await create.mutateAsync({ body, headers: idempotency.headers() });
      idempotency.settle();
      onSaved(feeding);
    } catch (error) {
      idempotency.settle(error);
      const { fieldErrors, formMessage } = mapServerErrors(error, Object.keys(FEEDING_FIELD_OF));
      fieldErrors.forEach(({ field, message }, index) => {
        const name = FEEDING_FIELD_OF[field];
        if (name) setError(name, { type: 'server', message }, { shouldFocus: index === 0 });
      });
      if (formMessage !== null) setError('root.server', { type: 'server', message: formMessage });
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <Stack spacing={1}>
        <Typography variant="h3" component="h2">
          Ratio (starter : flour : water)
        </Typography>
        <Controller
          control={control}
          name="ratio"
          render={({ field }) => <RatioField value={field.value} onChange={field.onChange} />}
        />
      </Stack>
      {ratio !== 'custom' && (
        <FormTextField
          control={control}
          name="totalG"
          label="Total in the jar after feeding"
          helperText="Starter, flour and water together"
          slotProps={{ ...unit('g'), htmlInput: decimal }}
        />
      )}
      <Stack direction="row" spacing={1}>
        <FormTextField
          control={control}
          name="starterG"
          label="Starter"
          slotProps={{ ...unit('g'), htmlInput: decimal }}
          disabled={ratio !== 'custom'}
        />
        <FormTextField
          control={control}
          name="flourG"
          label="Flour"
          slotProps={{ ...unit('g'), htmlInput: decimal }}
          disabled={ratio !== 'custom'}
        />
        <FormTextField
          control={control}
          name="waterG"
          label="Water"
          slotProps={{ ...unit('g'), htmlInput: decimal }}
          disabled={ratio !== 'custom'}
        />
      </Stack>
      <FormTextField control={control} name="flour" label="Flour or blend" />
      <FormTextField
        control={control}
        name="fedAt"
        label="Fed at"
        type="datetime-local"
        helperText="Now, unless you fed it earlier."
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <Stack direction="row" spacing={1}>
        <FormTextField
          control={control}
          name="temperature"
          label="Room or jar temperature"
          slotProps={{ ...unit(tUnit), htmlInput: decimal }}
        />
        <FormTextField
          control={control}
          name="initialHeight"
          label="Height in the jar now"
          helperText="From the jar’s base"
          slotProps={{ ...unit(hUnit), htmlInput: decimal }}
        />
      </Stack>
      <Stack spacing={1}>
        <Typography variant="h3" component="h2">
          What you noticed
        </Typography>
        <Controller
          control={control}
          name="observations"
          render={({ field }) => <ObservationChips value={field.value} onChange={field.onChange} />}
        />
      </Stack>
      {observations.includes('discolouration') && (
        <Alert severity="error" role="alert">
          {DISCOLOURATION_CAUTION}
        </Alert>
      )}
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={{ minHeight: 56 }}>
        Save feeding
      </Button>
    </Stack>
  );
}
