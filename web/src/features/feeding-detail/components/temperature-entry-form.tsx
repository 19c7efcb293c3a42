import type { Account } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { unitSlotProps } from '@/components/form/unit-slot-props';
import { toLocalInput } from '@/lib/format/local-input';
import { applyMappedServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateTemperature } from '../api/create-temperature';
import { toNewReading, type TemperatureEntryValues } from '../utils/temperature-entry';

// One reading is sent as a batch of one, so the API names its fields by position in the list.
const FIELD_OF: Record<string, keyof TemperatureEntryValues> = {
  'readings.0.temperatureC': 'temperature',
  'readings.0.takenAt': 'takenAt',
};

/** Add one reading: the temperature in the baker's unit, taken now unless they say when. */
export function TemperatureEntryForm({ feedingId, account }: { feedingId: string; account: Account }) {
  const create = useCreateTemperature(feedingId);
  const idempotency = useIdempotencyKey();
  const [defaultTakenAt, setDefaultTakenAt] = useState(() => toLocalInput(new Date()));
  const { control, handleSubmit, setError, reset, formState } = useForm<TemperatureEntryValues>({
    defaultValues: { takenAt: defaultTakenAt, temperature: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    const reading = toNewReading(values, account, values.takenAt !== defaultTakenAt, new Date());
    if (!reading) {
      setError('temperature', { type: 'required', message: 'Enter the temperature.' }, { shouldFocus: true });
      return;
    }
    try {
      await create.mutateAsync({ reading, headers: idempotency.headers() });
      idempotency.settle();
      const now = toLocalInput(new Date());
      setDefaultTakenAt(now);
      reset({ takenAt: now, temperature: '' });
    } catch (error) {
      idempotency.settle(error);
      applyMappedServerErrors(error, setError, FIELD_OF);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2} aria-label="Add a reading">
      <Typography variant="h3" component="h3">
        Add a reading
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextField
          control={control}
          name="temperature"
          label="Temperature"
          sx={{ flex: 1 }}
          slotProps={unitSlotProps(`°${account.temperatureUnit}`)}
        />
        <FormTextField
          control={control}
          name="takenAt"
          label="Taken at"
          type="datetime-local"
          sx={{ flex: 1 }}
          slotProps={{ inputLabel: { shrink: true } }}
        />
      </Stack>
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="outlined" size="large" loading={formState.isSubmitting}>
        Add reading
      </Button>
    </Stack>
  );
}
