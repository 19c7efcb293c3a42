import type { Account, Feeding, RiseCheck } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { unitSlotProps } from '@/components/form/unit-slot-props';
import { formatHeight, heightUnit } from '@/lib/format/units';
import { applyMappedServerErrors } from '@/lib/form-errors';
import { useUpdateRiseCheck } from '../api/update-rise-check';
import { riseCheckChanges, riseCheckValues, type RiseCheckEditValues } from '../utils/rise-check-edit';

// The API's fields → this form's; "% rise" and "× initial" are not offered here, so all is height.
const FIELD_OF: Record<string, keyof RiseCheckEditValues> = {
  heightMm: 'height',
  temperatureC: 'temperature',
  takenAt: 'takenAt',
};

interface RiseCheckDialogProps {
  check: RiseCheck;
  feeding: Feeding;
  account: Account;
  onClose: () => void;
}

/** Correct one rise check: its height, temperature or time. */
export function RiseCheckDialog({ check, feeding, account, onClose }: RiseCheckDialogProps) {
  const update = useUpdateRiseCheck();
  const [before] = useState(() => riseCheckValues(check, account));
  const { control, handleSubmit, setError, formState } = useForm<RiseCheckEditValues>({ defaultValues: before });

  const onSubmit = handleSubmit(async (values) => {
    const body = riseCheckChanges(values, before, account);
    if (!body) {
      setError('height', { type: 'required', message: 'Enter the height.' }, { shouldFocus: true });
      return;
    }
    if (Object.keys(body).length === 0) return onClose();
    try {
      await update.mutateAsync({ id: check.id, body });
      onClose();
    } catch (error) {
      applyMappedServerErrors(error, setError, FIELD_OF);
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="xs" aria-labelledby="rise-check-dialog-title">
      <form noValidate onSubmit={(e) => void onSubmit(e)}>
        <DialogTitle id="rise-check-dialog-title">Edit rise check</DialogTitle>
        <DialogContent>
          <Stack spacing={2.5} sx={{ pt: 1 }}>
            <FormTextField
              control={control}
              name="height"
              label="Height from the jar’s base"
              autoFocus
              helperText={
                feeding.initialHeightMm === null
                  ? undefined
                  : `It started at ${formatHeight(feeding.initialHeightMm, account.unitSystem)}.`
              }
              slotProps={unitSlotProps(heightUnit(account.unitSystem))}
            />
            <FormTextField
              control={control}
              name="temperature"
              label="Temperature then (optional)"
              slotProps={unitSlotProps(`°${account.temperatureUnit}`)}
            />
            <FormTextField
              control={control}
              name="takenAt"
              label="Taken at"
              type="datetime-local"
              slotProps={{ inputLabel: { shrink: true } }}
            />
            <FormAlert message={formState.errors.root?.server?.message} />
          </Stack>
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={onClose} disabled={formState.isSubmitting}>
            Cancel
          </Button>
          <Button type="submit" variant="contained" loading={formState.isSubmitting}>
            Save rise check
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
