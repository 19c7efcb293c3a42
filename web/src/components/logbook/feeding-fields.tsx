import type { Account } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { unitSlotProps } from '@/components/form/unit-slot-props';
import { heightUnit } from '@/lib/format/units';
import type { FeedingFormValues } from '@/lib/logbook/feeding-form';
import { DISCOLOURATION_CAUTION } from './cautions';
import { ObservationChips } from './observation-chips';

// The field groups of the feeding form, shared by Log feeding (a new feeding) and the feeding
// page (correcting one), so both ask the same way and a change reaches both.

type FeedingControl = Control<FeedingFormValues>;
const GRAMS = { starterG: 'Starter', flourG: 'Flour', waterG: 'Water' } as const;

/** Starter, flour and water in grams, side by side. */
export function GramsFields({
  control,
  disabled,
  rules,
}: {
  control: FeedingControl;
  disabled?: boolean;
  /** Checks every weight alike (a correction must keep all three). */
  rules?: { validate: (text: unknown) => boolean | string };
}) {
  return (
    <Stack direction="row" spacing={1}>
      {(['starterG', 'flourG', 'waterG'] as const).map((name) => (
        <FormTextField
          key={name}
          control={control}
          name={name}
          rules={rules}
          label={GRAMS[name]}
          slotProps={unitSlotProps('g')}
          disabled={disabled}
        />
      ))}
    </Stack>
  );
}

/** Room or jar temperature and the starter's height, in the baker's units. */
export function ConditionFields({
  control,
  account,
  heightLabel,
}: {
  control: FeedingControl;
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>;
  heightLabel: string;
}) {
  return (
    <Stack direction="row" spacing={1}>
      <FormTextField
        control={control}
        name="temperature"
        label="Room or jar temperature"
        slotProps={unitSlotProps(`°${account.temperatureUnit}`)}
      />
      <FormTextField
        control={control}
        name="initialHeight"
        label={heightLabel}
        helperText="From the jar’s base"
        slotProps={unitSlotProps(heightUnit(account.unitSystem))}
      />
    </Stack>
  );
}

/** The observation chips under their heading, with the discard caution when discolouration is picked. */
export function ObservationFields({ control, heading }: { control: FeedingControl; heading: 'h2' | 'h3' }) {
  const observations = useWatch({ control, name: 'observations' });
  return (
    <>
      <Stack spacing={1}>
        <Typography variant="h3" component={heading}>
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
    </>
  );
}
