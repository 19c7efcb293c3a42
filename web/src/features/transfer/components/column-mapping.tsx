import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { CHECK_COLUMNS, CSV_COLUMNS, REQUIRED_COLUMNS, type CsvColumn } from '@peakwise/shared';
import { COLUMN_INFO } from '../utils/columns';
import type { ColumnMapping } from '../utils/csv-header';

const FEEDING_COLUMNS = CSV_COLUMNS.filter((c) => !CHECK_COLUMNS.includes(c));

interface ColumnMappingProps {
  headers: readonly string[];
  mapping: ColumnMapping;
  onChange: (column: CsvColumn, header: string) => void;
  /** Required columns the baker has not matched yet, after they tried to check. */
  missing: readonly CsvColumn[];
}

/** For each of our columns, which of the file's columns holds it; native selects suit a thumb. */
export function ColumnMappingFields({ headers, mapping, onChange, missing }: ColumnMappingProps) {
  const used = new Set(Object.values(mapping));
  const unused = headers.filter((h) => h !== '' && !used.has(h));

  const field = (column: CsvColumn) => {
    const required = REQUIRED_COLUMNS.includes(column);
    const isMissing = missing.includes(column);
    // The API reads a header spelled exactly like our column unless mapped elsewhere: say so.
    const readByName = mapping[column] === '' && headers.includes(column);
    return (
      <TextField
        key={column}
        select
        fullWidth
        required={required}
        label={COLUMN_INFO[column].label}
        value={mapping[column]}
        onChange={(e) => onChange(column, e.target.value)}
        error={isMissing}
        helperText={
          isMissing
            ? 'Choose the column of your file that holds this.'
            : readByName
              ? `Your file’s “${column}” column is still read by its name; rename it in the file to leave it out.`
              : COLUMN_INFO[column].hint || undefined
        }
        slotProps={{ select: { native: true }, inputLabel: { shrink: true }, htmlInput: { name: column } }}
      >
        <option value="">{required ? '— choose a column —' : '— not in this file —'}</option>
        {headers.map((header, i) =>
          header === '' ? null : (
            <option key={`${i}-${header}`} value={header}>
              {header}
            </option>
          ),
        )}
      </TextField>
    );
  };

  const grid = { display: 'grid', gap: 2.5, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } } as const;
  return (
    <Stack spacing={3}>
      <Stack spacing={2}>
        <Typography variant="h3" component="h3">
          The feeding
        </Typography>
        <Box sx={grid}>{FEEDING_COLUMNS.map(field)}</Box>
      </Stack>
      <Stack spacing={2}>
        <Typography variant="h3" component="h3">
          Its rise check (one per row, if any)
        </Typography>
        <Box sx={grid}>{CHECK_COLUMNS.map(field)}</Box>
      </Stack>
      {unused.length > 0 && (
        <Typography variant="body2" color="text.secondary">
          Not imported from your file: {unused.map((h) => `“${h}”`).join(', ')}.
        </Typography>
      )}
    </Stack>
  );
}
