import { GRAMS_MAX, type Account, type Feeding } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { ConditionFields, GramsFields, ObservationFields } from '@/components/logbook/feeding-fields';
import { parseNumber } from '@/lib/format/units';
import { applyMappedServerErrors } from '@/lib/form-errors';
import {
  FEEDING_FIELD_OF,
  feedingChanges,
  valuesFromFeeding,
  type FeedingFormValues,
} from '@/lib/logbook/feeding-form';
import { useUpdateFeeding } from '../api/update-feeding';
import { ratioWords } from '../utils/feeding-words';

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
  const [starterG, flourG, waterG] = useWatch({ control, name: ['starterG', 'flourG', 'waterG'] });
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
      applyMappedServerErrors(error, setError, FEEDING_FIELD_OF);
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
        <GramsFields control={control} rules={gramsRules} />
        <Typography variant="body2" color="text.secondary" aria-live="polite">
          {ratio ? `Ratio ${ratio} (starter : flour : water)` : 'Enter all three weights to see the ratio.'}
        </Typography>
      </Stack>
      <FormTextField control={control} name="flour" label="Flour or blend" />
      <ConditionFields control={control} account={account} heightLabel="Height after feeding" />
      <ObservationFields control={control} heading="h3" />
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
