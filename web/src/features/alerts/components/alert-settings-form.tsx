import {
  ALERT_KINDS,
  ALERT_LEAD_MINUTES_MAX,
  type AlertKind,
  type AlertPreferences,
  type UpdateAlertPreferencesRequest,
} from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useUpdateAlertPreferences } from '../api/alert-preferences';

const KIND_LABELS: Record<AlertKind, { name: string; hint: string }> = {
  'culture-ready': { name: 'Culture ready', hint: 'The ready window starts (minus your lead time)' },
  'past-peak': { name: 'Past peak', hint: 'The ready window has ended' },
  'feeding-due': { name: 'Feeding due', hint: 'Daily on the counter, weekly in the fridge' },
  'plan-step': { name: 'Bake plan steps', hint: 'Folds, end of bulk, out of the fridge, preheat, bake done' },
  comment: { name: 'Comments', hint: 'A new comment on a feeding or bake you follow' },
};

interface SettingsValues {
  leadMinutes: string;
  quiet: boolean;
  'quietHours.from': string;
  'quietHours.until': string;
  email: Record<AlertKind, boolean>;
  push: Record<AlertKind, boolean>;
}

function valuesOf(prefs: AlertPreferences): SettingsValues {
  return {
    leadMinutes: String(prefs.leadMinutes),
    quiet: prefs.quietHours !== null,
    'quietHours.from': prefs.quietHours?.from ?? '22:00',
    'quietHours.until': prefs.quietHours?.until ?? '07:00',
    email: Object.fromEntries(ALERT_KINDS.map((k) => [k, prefs.channels[k].email])) as Record<AlertKind, boolean>,
    push: Object.fromEntries(ALERT_KINDS.map((k) => [k, prefs.channels[k].push])) as Record<AlertKind, boolean>,
  };
}

const FIELDS = ['leadMinutes', 'quietHours.from', 'quietHours.until'] as const;

/** Lead time, quiet hours, and e-mail and push per alert kind; in the app is always on. */
export function AlertSettingsForm({ prefs, timeZone }: { prefs: AlertPreferences; timeZone: string }) {
  const update = useUpdateAlertPreferences();
  const [saved, setSaved] = useState(false);
  const { control, handleSubmit, setError, reset, formState } = useForm<SettingsValues>({
    defaultValues: valuesOf(prefs),
  });
  const quiet = useWatch({ control, name: 'quiet' });

  const onSubmit = handleSubmit(async (values) => {
    const body: UpdateAlertPreferencesRequest = {
      leadMinutes: Number(values.leadMinutes),
      quietHours: values.quiet ? { from: values['quietHours.from'], until: values['quietHours.until'] } : null,
      channels: Object.fromEntries(ALERT_KINDS.map((k) => [k, { email: values.email[k], push: values.push[k] }])),
    };
    try {
      reset(valuesOf(await update.mutateAsync(body)));
      setSaved(true);
    } catch (error) {
      setSaved(false);
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={3}>
      <FormTextField
        control={control}
        name="leadMinutes"
        label="Lead time before a culture is ready (min)"
        type="number"
        slotProps={{ htmlInput: { min: 0, max: ALERT_LEAD_MINUTES_MAX, step: 5, inputMode: 'numeric' } }}
        helperText={`0 to ${ALERT_LEAD_MINUTES_MAX} minutes`}
      />

      <Box>
        <Typography variant="h3" component="h3" gutterBottom>
          Quiet hours
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          No e-mail or push notification inside them ({timeZone}): they wait until the quiet hours end, or are dropped
          if stale by then. Alerts in the app still arrive.
        </Typography>
        <Controller
          control={control}
          name="quiet"
          render={({ field }) => (
            <FormControlLabel
              control={<Switch checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />}
              label="Keep quiet hours"
            />
          )}
        />
        {quiet && (
          <Stack direction="row" spacing={2} sx={{ mt: 1 }}>
            <FormTextField control={control} name="quietHours.from" label="From" type="time" sx={{ flex: 1 }} />
            <FormTextField control={control} name="quietHours.until" label="Until" type="time" sx={{ flex: 1 }} />
          </Stack>
        )}
      </Box>

      <Box>
        <Typography variant="h3" component="h3" gutterBottom>
          Channels
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          Every alert shows in the app. Push goes to the devices you turned on above.
        </Typography>
        <Stack spacing={1.5}>
          {ALERT_KINDS.map((kind) => (
            <Box key={kind} role="group" aria-label={KIND_LABELS[kind].name}>
              <Typography variant="subtitle2">{KIND_LABELS[kind].name}</Typography>
              <Typography variant="caption" color="text.secondary">
                {KIND_LABELS[kind].hint}
              </Typography>
              <Stack direction="row" sx={{ flexWrap: 'wrap', columnGap: 1 }}>
                <FormControlLabel control={<Switch checked disabled size="small" />} label="In the app" />
                {(['email', 'push'] as const).map((channel) => (
                  <Controller
                    key={channel}
                    control={control}
                    name={`${channel}.${kind}`}
                    render={({ field }) => (
                      <FormControlLabel
                        control={
                          <Switch
                            size="small"
                            checked={field.value}
                            onChange={(e) => field.onChange(e.target.checked)}
                          />
                        }
                        label={channel === 'email' ? 'E-mail' : 'Push'}
                      />
                    )}
                  />
                ))}
              </Stack>
            </Box>
          ))}
        </Stack>
      </Box>

      <FormAlert message={formState.errors.root?.server?.message} />
      {saved && !formState.isDirty && <Alert severity="success">Alert settings saved.</Alert>}
      <Box>
        <Button type="submit" variant="contained" disabled={formState.isSubmitting}>
          Save alert settings
        </Button>
      </Box>
    </Stack>
  );
}
