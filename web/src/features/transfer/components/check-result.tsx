import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import type { ImportResult } from '@peakwise/shared';
import type { ColumnMapping } from '../utils/csv-header';
import type { Failure } from '../utils/import-failure';
import { importLabel } from '../utils/import-words';
import { CheckCounts } from './check-counts';
import { ImportErrors } from './import-errors';
import { PreviewTable } from './preview-table';

interface CheckResultProps {
  cultureName: string;
  result: ImportResult | null;
  failure: Failure | null;
  mapping: ColumnMapping;
  importing: boolean;
  onConfirm: () => void;
}

/** What the dry run found: counts, rows to fix, the first rows as read, and the one confirm button. */
export function CheckResult({ cultureName, result, failure, mapping, importing, onConfirm }: CheckResultProps) {
  const label = result && result.errors.length === 0 ? importLabel(result) : null;
  return (
    <Card component="section" aria-labelledby="check-heading">
      <CardContent sx={{ display: 'grid', gap: 2 }}>
        <Typography id="check-heading" variant="h2">
          3. Check and import
        </Typography>
        {failure?.message && (
          <Alert severity="error" role="alert">
            {failure.message}
          </Alert>
        )}
        {failure && failure.errors.length > 0 && <ImportErrors errors={failure.errors} mapping={mapping} />}
        {result && <CheckCounts result={result} />}
        {result && result.errors.length > 0 && <ImportErrors errors={result.errors} mapping={mapping} />}
        {result && <PreviewTable rows={result.preview} mapping={mapping} />}
        {result && result.errors.length === 0 && !label && (
          <Alert severity="info" role="status">
            Nothing new: everything in this file is already in {cultureName}’s logbook.
          </Alert>
        )}
        {label && (
          <>
            <Typography color="text.secondary">
              Nothing is imported until you confirm. Rows already in the logbook are skipped, not doubled.
            </Typography>
            <Button variant="contained" size="large" onClick={onConfirm} loading={importing} sx={{ minHeight: 56 }}>
              {label}
            </Button>
          </>
        )}
      </CardContent>
    </Card>
  );
}
