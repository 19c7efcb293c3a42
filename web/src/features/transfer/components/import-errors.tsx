import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import type { ImportError } from '@peakwise/shared';
import type { ColumnMapping } from '../utils/csv-header';
import { errorPlace } from '../utils/import-words';

/** The rows to fix, by line of the file and the baker's own column name. */
export function ImportErrors({ errors, mapping }: { errors: readonly ImportError[]; mapping: ColumnMapping }) {
  const rows = new Set(errors.map((e) => e.line)).size;
  return (
    <Alert severity="error" role="alert" data-testid="import-errors">
      <AlertTitle>
        {rows === 1 ? '1 row needs' : `${rows} rows need`} another look. Nothing has been imported.
      </AlertTitle>
      <Box
        component="ul"
        sx={{ m: 0, pl: 2.5, maxHeight: 320, overflowY: 'auto', display: 'grid', gap: 0.75, overflowWrap: 'anywhere' }}
      >
        {errors.map((error, i) => (
          <li key={`${error.line}-${error.field}-${i}`}>
            <strong>{errorPlace(error, mapping)}:</strong> {error.message}
          </li>
        ))}
      </Box>
      <Box sx={{ mt: 1 }}>Correct these rows in your file (line 1 is the header), then choose it again.</Box>
    </Alert>
  );
}
