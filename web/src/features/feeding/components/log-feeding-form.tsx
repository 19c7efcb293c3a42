import type { Account, Culture, Feeding } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEffect, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { unitSlotProps } from '@/components/form/unit-slot-props';
import { ConditionFields, GramsFields, ObservationFields } from '@/components/logbook/feeding-fields';
import { applyMappedServerErrors } from '@/lib/form-errors';
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

interface LogFeedingFormProps {
  culture: Culture;
  last: Feeding | undefined;
  account: Account;
  /** `undefined`: kept on this device (offline) and sent later. */
  onSaved: (feeding: Feeding | undefined) => void;
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
      applyMappedServerErrors(error, setError, FEEDING_FIELD_OF);
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
          slotProps={unitSlotProps('g')}
        />
      )}
      <GramsFields control={control} disabled={ratio !== 'custom'} />
      <FormTextField control={control} name="flour" label="Flour or blend" />
      <FormTextField
        control={control}
        name="fedAt"
        label="Fed at"
        type="datetime-local"
        helperText="Now, unless you fed it earlier."
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <ConditionFields control={control} account={account} heightLabel="Height in the jar now" />
      <ObservationFields control={control} heading="h2" />
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={{ minHeight: 56 }}>
        Save feeding
      </Button>
    </Stack>
  );
}
