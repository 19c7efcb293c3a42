import { GRAMS_MAX, type Account, type Feeding } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { DISCOLOURATION_CAUTION } from '@/components/logbook/cautions';
import { ObservationChips } from '@/components/logbook/observation-chips';
import { heightUnit, parseNumber } from '@/lib/format/units';
import { mapServerErrors } from '@/lib/form-errors';
import {
  FEEDING_FIELD_OF,
  feedingChanges,
  valuesFromFeeding,
  type FeedingFormValues,
} from '@/lib/logbook/feeding-form';
import { useUpdateFeeding } from '../api/update-feeding';
import { ratioWords } from '../utils/feeding-words';

const unit = (u: string) => ({ input: { endAdornment: <InputAdornment position="end">{u}</InputAdornment> } });
const decimal = { inputMode: 'decimal' as const };

// A correction must keep the three weights: an emptied field would otherwise be left out of the
// PATCH and silently keep its old value. The range is the API's; it stays the authority.
const gramsRules = {
  validate: (text: unknown) => {
    const grams = typeof text === 'string' ? parseNumber(text) : null;
    return (
      (grams !== null && grams > 0 && grams <= GRAMS_MAX) || `Enter a weight above 0 g and at most ${GRAMS_MAX} g.`
    );
  },
};

interface EditFeedingFormProps {
  feeding: Feeding;
  account: Account;
  onSaved: () => void;
  onCancel: () => void;
}

/** The recorded feeding in the Log feeding form's fields; saving sends only what changed. */
export function EditFeedingForm({ feeding, account, onSaved, onCancel }: EditFeedingFormProps) {
  const update = useUpdateFeeding(feeding.id);
  const [recorded] = useState(() => valuesFromFeeding(feeding, account));
  const { control, handleSubmit, setError, formState } = useForm<FeedingFormValues>({ defaultValues: recorded });
  const [starterG, flourG, waterG, observations] = useWatch({
    control,
    name: ['starterG', 'flourG', 'waterG', 'observations'],
  });
  const grams = [starterG, flourG, waterG].map(parseNumber);
  const ratio =
    grams.every((g) => g !== null && g > 0) &&
    ratioWords({ starterG: grams[0]!, flourG: grams[1]!, waterG: grams[2]! });

  const onSubmit = handleSubmit(async (values) => {
    const changes = feedingChanges(values, recorded, account);
    if (Object.keys(changes).length === 0) return onCancel();
    try {
      await update.mutateAsync(changes);
      onSaved();
    } catch (error) {
      const { fieldErrors, formMessage } = mapServerErrors(error, Object.keys(FEEDING_FIELD_OF));
      fieldErrors.forEach(({ field, message }, index) => {
        const name = FEEDING_FIELD_OF[field];
        if (name) setError(name, { type: 'server', message }, { shouldFocus: index === 0 });
      });
      if (formMessage !== null) setError('root.server', { type: 'server', message: formMessage });
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5} aria-label="Edit feeding">
      <FormTextField
        control={control}
        name="fedAt"
        label="Fed at"
        type="datetime-local"
        helperText="Its rise checks and temperatures can’t be earlier."
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <Stack spacing={1}>
        <Stack direction="row" spacing={1}>
          {(['starterG', 'flourG', 'waterG'] as const).map((name) => (
            <FormTextField
              key={name}
              control={control}
              name={name}
              rules={gramsRules}
              label={{ starterG: 'Starter', flourG: 'Flour', waterG: 'Water' }[name]}
              slotProps={{ ...unit('g'), htmlInput: decimal }}
            />
          ))}
        </Stack>
        <Typography variant="body2" color="text.secondary" aria-live="polite">
          {ratio ? `Ratio ${ratio} (starter : flour : water)` : 'Enter all three weights to see the ratio.'}
        </Typography>
      </Stack>
      <FormTextField control={control} name="flour" label="Flour or blend" />
      <Stack direction="row" spacing={1}>
        <FormTextField
          control={control}
          name="temperature"
          label="Room or jar temperature"
          slotProps={{ ...unit(`°${account.temperatureUnit}`), htmlInput: decimal }}
        />
        <FormTextField
          control={control}
          name="initialHeight"
          label="Height after feeding"
          helperText="From the jar’s base"
          slotProps={{ ...unit(heightUnit(account.unitSystem)), htmlInput: decimal }}
        />
      </Stack>
      <Stack spacing={1}>
        <Typography variant="h3" component="h3">
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
      <Stack direction="row" spacing={1}>
        <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={{ flex: 1 }}>
          Save changes
        </Button>
        <Button size="large" onClick={onCancel} disabled={formState.isSubmitting}>
          Cancel
        </Button>
      </Stack>
    </Stack>
  );
}
