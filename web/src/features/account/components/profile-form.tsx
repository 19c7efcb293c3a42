import {
  TEMPERATURE_UNITS,
  UNIT_SYSTEMS,
  type Account,
  type TemperatureUnit,
  type UnitSystem,
  type UpdateAccountRequest,
} from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { displayNameRules } from '@/lib/validation';
import { useUpdateAccount } from '../api/update-account';
import { ChoiceField } from './choice-field';
import { TimeZoneField } from './time-zone-field';

type ProfileValues = Required<UpdateAccountRequest>;
const FIELDS = ['displayName', 'unitSystem', 'temperatureUnit', 'timeZone'] as const;

const UNIT_LABELS: Record<UnitSystem, string> = {
  metric: 'Metric (g, ml, cm)',
  us: 'US (oz, cups, in)',
};
const TEMPERATURE_LABELS: Record<TemperatureUnit, string> = {
  C: 'Celsius (°C)',
  F: 'Fahrenheit (°F)',
};

function valuesOf(account: Account): ProfileValues {
  return {
    displayName: account.displayName,
    unitSystem: account.unitSystem,
    temperatureUnit: account.temperatureUnit,
    timeZone: account.timeZone,
  };
}

/** Name and the units every number in Peakwise is shown in. */
export function ProfileForm({ account }: { account: Account }) {
  const update = useUpdateAccount();
  const [saved, setSaved] = useState(false);
  const { control, handleSubmit, setError, reset, formState } = useForm<ProfileValues>({
    defaultValues: valuesOf(account),
  });

  const onSubmit = handleSubmit(async (values) => {
    // PATCH only what the baker changed, so a stale tab can't undo an edit made elsewhere.
    const { dirtyFields } = formState;
    const body: UpdateAccountRequest = {};
    if (dirtyFields.displayName) body.displayName = values.displayName.trim();
    if (dirtyFields.unitSystem) body.unitSystem = values.unitSystem;
    if (dirtyFields.temperatureUnit) body.temperatureUnit = values.temperatureUnit;
    if (dirtyFields.timeZone) body.timeZone = values.timeZone;
    try {
      const updated = await update.mutateAsync(body);
      reset(valuesOf(updated));
      setSaved(true);
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={3}>
      <FormTextField
        control={control}
        name="displayName"
        label="Your name"
        autoComplete="name"
        rules={displayNameRules}
      />
      <ChoiceField
        control={control}
        name="unitSystem"
        label="Weights and measures"
        options={UNIT_SYSTEMS.map((value) => ({ value, label: UNIT_LABELS[value] }))}
      />
      <ChoiceField
        control={control}
        name="temperatureUnit"
        label="Temperature"
        options={TEMPERATURE_UNITS.map((value) => ({ value, label: TEMPERATURE_LABELS[value] }))}
      />
      <TimeZoneField control={control} name="timeZone" />
      <FormAlert message={formState.errors.root?.server?.message} />
      {saved && !formState.isDirty && (
        <Alert severity="success" role="status">
          Saved. Peakwise will use these from now on.
        </Alert>
      )}
      <Box>
        <Button type="submit" variant="contained" loading={formState.isSubmitting} disabled={!formState.isDirty}>
          Save changes
        </Button>
      </Box>
    </Stack>
  );
}
