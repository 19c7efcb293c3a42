import {
  CULTURE_NAME_MAX_LENGTH,
  type CreateCultureRequest,
  type Culture,
  type CultureLocation,
} from '@peakwise/shared';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { Controller, useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { parseNumber } from '@/lib/format/units';
import { applyServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateCulture } from '@/lib/logbook/create-culture';
import { bigToggleSx } from '@/components/logbook/toggle-sx';

interface Values {
  name: string;
  defaultFlour: string;
  defaultHydrationPct: string;
  location: CultureLocation;
  startedOn: string;
  parentCultureId: string;
}

const FIELDS = ['name', 'defaultFlour', 'defaultHydrationPct', 'location', 'startedOn', 'parentCultureId'] as const;

interface CreateCultureFormProps {
  /** The baker's other cultures, offered as the parent. */
  others: Culture[];
  /** Preset parent: "split this culture". */
  parent?: Culture;
  submitLabel?: string;
  onCreated: (culture: Culture) => void;
}

/** Name, flour, hydration, where it lives, started on and (optionally) the culture it came from. */
export function CreateCultureForm({ others, parent, submitLabel = 'Add culture', onCreated }: CreateCultureFormProps) {
  const create = useCreateCulture();
  const idempotency = useIdempotencyKey();
  const { control, handleSubmit, setError, formState } = useForm<Values>({
    defaultValues: {
      name: parent ? `${parent.name} II` : '',
      defaultFlour: parent?.defaultFlour ?? '',
      defaultHydrationPct: parent?.defaultHydrationPct?.toString() ?? '100',
      location: 'counter',
      startedOn: parent ? new Date().toISOString().slice(0, 10) : '',
      parentCultureId: parent?.id ?? '',
    },
  });

  const onSubmit = handleSubmit(async (values) => {
    const body: CreateCultureRequest = {
      name: values.name.trim(),
      defaultFlour: values.defaultFlour.trim() || null,
      defaultHydrationPct: parseNumber(values.defaultHydrationPct),
      location: values.location,
      startedOn: values.startedOn || null,
      parentCultureId: values.parentCultureId || null,
    };
    try {
      const culture = await create.mutateAsync({ body, headers: idempotency.headers() });
      idempotency.settle();
      onCreated(culture);
    } catch (error) {
      idempotency.settle(error);
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <FormTextField
        control={control}
        name="name"
        label="Name"
        placeholder="e.g. Bramble"
        rules={{
          validate: (v: string) => v.trim() !== '' || 'Give your culture a name.',
          maxLength: { value: CULTURE_NAME_MAX_LENGTH, message: `At most ${CULTURE_NAME_MAX_LENGTH} characters.` },
        }}
      />
      <FormTextField
        control={control}
        name="defaultFlour"
        label="Flour it is fed"
        placeholder="e.g. 80 % bread flour, 20 % whole rye"
      />
      <FormTextField
        control={control}
        name="defaultHydrationPct"
        label="Hydration (%)"
        helperText="Water per flour by weight: 100 % is equal weights."
        slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      />
      <Stack spacing={1}>
        <Typography variant="body2" color="text.secondary" id="culture-location-label">
          Where it lives
        </Typography>
        <Controller
          control={control}
          name="location"
          render={({ field }) => (
            <ToggleButtonGroup
              exclusive
              fullWidth
              color="primary"
              aria-labelledby="culture-location-label"
              value={field.value}
              onChange={(_, v: CultureLocation | null) => v && field.onChange(v)}
            >
              <ToggleButton value="counter" sx={bigToggleSx}>
                On the counter
              </ToggleButton>
              <ToggleButton value="fridge" sx={bigToggleSx}>
                In the fridge
              </ToggleButton>
            </ToggleButtonGroup>
          )}
        />
      </Stack>
      <FormTextField
        control={control}
        name="startedOn"
        label="Started on"
        type="date"
        slotProps={{ inputLabel: { shrink: true } }}
      />
      {others.length > 0 && (
        <FormTextField control={control} name="parentCultureId" label="Came from (parent culture)" select>
          <MenuItem value="">None: started from scratch or received</MenuItem>
          {others.map((c) => (
            <MenuItem key={c.id} value={c.id}>
              {c.name}
            </MenuItem>
          ))}
        </FormTextField>
      )}
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        {submitLabel}
      </Button>
    </Stack>
  );
}
