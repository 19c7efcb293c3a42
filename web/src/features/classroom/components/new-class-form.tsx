import {
  CLASS_DESCRIPTION_MAX_LENGTH,
  CLASS_MAX_DAYS,
  CLASS_NAME_MAX_LENGTH,
  type BakingClass,
  type CreateClassRequest,
} from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateClass } from '../api/create-class';
import { dayNumber } from '../utils/class-dates';

interface Values {
  name: string;
  description: string;
  startsOn: string;
  endsOn: string;
}

const FIELDS = ['name', 'description', 'startsOn', 'endsOn'] as const;

/** Name, what it is about, first and last day: enough to invite students to. */
export function NewClassForm({ onCreated }: { onCreated: (created: BakingClass) => void }) {
  const create = useCreateClass();
  const idempotency = useIdempotencyKey();
  const { control, handleSubmit, setError, formState, getValues } = useForm<Values>({
    defaultValues: { name: '', description: '', startsOn: '', endsOn: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    const body: CreateClassRequest = {
      name: values.name.trim(),
      description: values.description.trim(),
      startsOn: values.startsOn,
      endsOn: values.endsOn,
    };
    try {
      const created = await create.mutateAsync({ body, headers: idempotency.headers() });
      idempotency.settle();
      onCreated(created);
    } catch (error) {
      idempotency.settle(error);
      applyServerErrors(error, setError, FIELDS);
    }
  });

  const dateProps = { type: 'date', slotProps: { inputLabel: { shrink: true } } } as const;
  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <FormTextField
        control={control}
        name="name"
        label="Class name"
        placeholder="e.g. Weekend Levain"
        rules={{
          validate: (v: string) => v.trim() !== '' || 'Give the class a name.',
          maxLength: { value: CLASS_NAME_MAX_LENGTH, message: `At most ${CLASS_NAME_MAX_LENGTH} characters.` },
        }}
      />
      <FormTextField
        control={control}
        name="description"
        label="What the class covers"
        multiline
        minRows={2}
        helperText="Students read this before they join."
        rules={{
          maxLength: {
            value: CLASS_DESCRIPTION_MAX_LENGTH,
            message: `At most ${CLASS_DESCRIPTION_MAX_LENGTH} characters.`,
          },
        }}
      />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextField
          control={control}
          name="startsOn"
          label="First day"
          fullWidth
          {...dateProps}
          rules={{ required: 'When does it start?' }}
        />
        <FormTextField
          control={control}
          name="endsOn"
          label="Last day"
          fullWidth
          {...dateProps}
          rules={{
            required: 'When does it end?',
            validate: (end: string) => {
              const start = getValues('startsOn');
              if (!start || !end) return true;
              const days = dayNumber(end) - dayNumber(start) + 1;
              if (days < 1) return 'The last day comes on or after the first.';
              return days <= CLASS_MAX_DAYS || `A class runs at most ${CLASS_MAX_DAYS} days.`;
            },
          }}
        />
      </Stack>
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        Create class
      </Button>
    </Stack>
  );
}
