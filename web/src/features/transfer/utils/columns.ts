import { FEEDING_OBSERVATIONS, OBSERVATION_SEPARATOR, type CsvColumn } from '@peakwise/shared';

/** What each of our CSV columns holds, in a baker's words; the file itself is always SI. */
export const COLUMN_INFO: Record<CsvColumn, { label: string; short: string; hint: string }> = {
  fed_at: { label: 'Fed at', short: 'Fed at', hint: 'Date and time with a time zone, e.g. 2026-03-01T07:30:00Z' },
  starter_g: { label: 'Starter (g)', short: 'Starter g', hint: 'Grams of starter kept' },
  flour_g: { label: 'Flour (g)', short: 'Flour g', hint: 'Grams of flour added' },
  water_g: { label: 'Water (g)', short: 'Water g', hint: 'Grams of water added' },
  flour: { label: 'Flour or blend', short: 'Flour', hint: 'Its name, e.g. whole rye' },
  temperature_c: { label: 'Room or jar temperature (°C)', short: 'Temp. °C', hint: 'Where the jar stood' },
  water_temperature_c: { label: 'Water temperature (°C)', short: 'Water °C', hint: '' },
  initial_height_mm: { label: 'Height after feeding (mm)', short: 'Height mm', hint: 'From the jar’s base' },
  observations: {
    label: 'What you noticed',
    short: 'Noticed',
    hint: `Words from: ${FEEDING_OBSERVATIONS.join(', ')}; separated by "${OBSERVATION_SEPARATOR}"`,
  },
  notes: { label: 'Notes', short: 'Notes', hint: 'Any text' },
  check_taken_at: { label: 'Rise check: taken at', short: 'Checked at', hint: 'Date and time with a time zone' },
  check_height_mm: { label: 'Rise check: height (mm)', short: 'Check mm', hint: 'From the jar’s base' },
  check_temperature_c: { label: 'Rise check: temperature (°C)', short: 'Check °C', hint: '' },
};

/** Our column's label, or the field as the server named it ("row", "file"). */
export function columnLabel(field: string): string {
  return field in COLUMN_INFO ? COLUMN_INFO[field as CsvColumn].label : field;
}
