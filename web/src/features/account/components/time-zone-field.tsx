import Autocomplete from '@mui/material/Autocomplete';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMemo } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import {
  deviceTimeZone,
  supportedTimeZones,
  timeZoneLabel,
  timeZoneOffset,
  timeZoneOptions,
} from '../utils/time-zones';

interface TimeZoneFieldProps<T extends FieldValues> {
  control: Control<T>;
  name: FieldPath<T>;
}

/** Pick an IANA zone by typing a city; suggests this device's own zone when it differs. */
export function TimeZoneField<T extends FieldValues>({ control, name }: TimeZoneFieldProps<T>) {
  const { field, fieldState } = useController({ control, name });
  const device = useMemo(() => deviceTimeZone(), []);
  const value = String(field.value ?? '');
  const options = useMemo(() => timeZoneOptions(supportedTimeZones(), device), [device]);
  // A saved zone this browser doesn't list (older Intl data) must still show as chosen.
  const allOptions = options.includes(value) ? options : timeZoneOptions(options, value);
  const now = useMemo(() => new Date(), []);

  const suggestion =
    device && device !== value ? (
      <>
        This device is set to {timeZoneLabel(device)}.{' '}
        <Button
          size="small"
          onClick={() => field.onChange(device)}
          sx={{ p: 0, minWidth: 0, verticalAlign: 'baseline' }}
        >
          Use {timeZoneLabel(device)}
        </Button>
      </>
    ) : (
      'Forecasts and reminders use this zone.'
    );

  return (
    <Autocomplete
      options={allOptions}
      value={value}
      onChange={(_event, zone) => field.onChange(zone)}
      onBlur={field.onBlur}
      disableClearable
      autoHighlight
      getOptionLabel={timeZoneLabel}
      renderOption={({ key, ...props }, zone) => (
        <Box component="li" key={key} {...props} sx={{ display: 'flex', gap: 1 }}>
          <span>{timeZoneLabel(zone)}</span>
          <Typography component="span" variant="body2" color="text.secondary" sx={{ ml: 'auto' }}>
            {timeZoneOffset(zone, now)}
          </Typography>
        </Box>
      )}
      renderInput={(params) => (
        <TextField
          {...params}
          name={field.name}
          label="Time zone"
          inputRef={field.ref}
          error={fieldState.error !== undefined}
          helperText={fieldState.error?.message ?? suggestion}
        />
      )}
    />
  );
}
