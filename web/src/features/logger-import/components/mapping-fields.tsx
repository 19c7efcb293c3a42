import Box from '@mui/material/Box';
import TextField from '@mui/material/TextField';
import {
  LOGGER_DATE_FORMAT_LABELS,
  LOGGER_DATE_FORMATS,
  type LoggerDateFormat,
  type LoggerMapping,
  type LoggerUnit,
} from '@peakwise/shared';
import type { ReactNode } from 'react';

interface MappingFieldsProps {
  headers: readonly string[];
  mapping: LoggerMapping;
  accountZone: string;
  /** Why the unit and zone were preselected, shown under them. */
  unitHint: string;
  zoneHint: string;
  onChange: (mapping: LoggerMapping) => void;
}

/** The zones this browser knows; the account's and UTC first, as they are the likely ones. */
function zoneChoices(accountZone: string): string[] {
  const all = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return [...new Set([accountZone, 'UTC', ...all])];
}

/** Which column is which and how to read it; native selects suit a thumb. */
export function MappingFields({ headers, mapping, accountZone, unitHint, zoneHint, onChange }: MappingFieldsProps) {
  const select = (
    label: string,
    value: string | number,
    set: (v: string) => void,
    options: ReactNode,
    hint?: string,
  ) => (
    <TextField
      select
      fullWidth
      label={label}
      value={value}
      onChange={(e) => set(e.target.value)}
      helperText={hint}
      slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
    >
      {options}
    </TextField>
  );
  const columnOptions = headers.map((h, i) => (
    <option key={`${i}-${h}`} value={i}>
      {h === '' ? `Column ${i + 1}` : h}
    </option>
  ));

  return (
    <Box sx={{ display: 'grid', gap: 2.5, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } }}>
      {select('Time column', mapping.timeColumn, (v) => onChange({ ...mapping, timeColumn: Number(v) }), columnOptions)}
      {select(
        'Temperature column',
        mapping.temperatureColumn,
        (v) => onChange({ ...mapping, temperatureColumn: Number(v) }),
        columnOptions,
      )}
      {select(
        'Temperatures are in',
        mapping.unit,
        (v) => onChange({ ...mapping, unit: v as LoggerUnit }),
        <>
          <option value="C">°C (Celsius)</option>
          <option value="F">°F (Fahrenheit)</option>
        </>,
        unitHint,
      )}
      {select(
        'Dates are written',
        mapping.dateFormat,
        (v) => onChange({ ...mapping, dateFormat: v as LoggerDateFormat }),
        LOGGER_DATE_FORMATS.map((f) => (
          <option key={f} value={f}>
            {LOGGER_DATE_FORMAT_LABELS[f]}
          </option>
        )),
      )}
      {select(
        'Times without a zone are in',
        mapping.timeZone,
        (v) => onChange({ ...mapping, timeZone: v }),
        zoneChoices(accountZone).map((z) => (
          <option key={z} value={z}>
            {z === accountZone ? `${z} (your account)` : z}
          </option>
        )),
        zoneHint,
      )}
    </Box>
  );
}
