import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { REQUIRED_COLUMNS, type CsvColumn, type ImportResult } from '@peakwise/shared';
import { useEffect, useRef, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { isApiError } from '@/lib/api-client';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCulture } from '@/lib/logbook/get-culture';
import { useImportFeedings } from '../api/import-feedings';
import { mappingForRequest, sameHeaders, suggestMapping, type ColumnMapping } from '../utils/csv-header';
import { failureOf, type Failure } from '../utils/import-failure';
import { importedText } from '../utils/import-words';
import { CheckResult } from './check-result';
import { ColumnMappingFields } from './column-mapping';
import { FilePicker, type PickedFile } from './file-picker';
import { SiNote } from './si-note';

/**
 * Import feedings from a CSV: choose a file, match its columns to ours, check it (a dry run that
 * writes nothing), then confirm. The confirm button exists only for a checked file without errors.
 */
export function ImportFeedingsPage({ cultureId }: { cultureId: string }) {
  const culture = useCulture(cultureId);
  const importer = useImportFeedings(cultureId);
  // A dry run writes nothing, so each check gets a fresh key; the real import keeps its key
  // across a retry after a lost connection, so it can never write twice.
  const checkKey = useIdempotencyKey();
  const importKey = useIdempotencyKey();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [mapping, setMapping] = useState<{ headers: string[]; columns: ColumnMapping } | null>(null);
  const [missing, setMissing] = useState<CsvColumn[]>([]);
  const [checked, setChecked] = useState<ImportResult | null>(null);
  const [failure, setFailure] = useState<Failure | null>(null);
  const [imported, setImported] = useState<ImportResult | null>(null);
  const results = useRef<HTMLDivElement>(null);

  // The outcome appears below the button the thumb just pressed; bring it into view.
  useEffect(() => {
    if (checked || failure) results.current?.scrollIntoView({ block: 'start' });
  }, [checked, failure]);

  if (culture.isPending) return <PageLoader />;
  if (culture.isError) return <LoadError error={culture.error} onRetry={() => void culture.refetch()} />;
  const name = culture.data.name;

  /** Anything the last check said no longer holds once the file or the mapping changes. */
  const forgetCheck = () => {
    setChecked(null);
    setFailure(null);
    importKey.settle();
  };

  const onPicked = (picked: PickedFile) => {
    setFile(picked);
    // A corrected copy of the same file keeps the columns the baker already matched.
    if (!mapping || !sameHeaders(mapping.headers, picked.headers)) {
      setMapping({ headers: picked.headers, columns: suggestMapping(picked.headers) });
      setMissing([]);
    }
  };

  const send = (dryRun: boolean) => {
    if (!file || !mapping) throw new Error('No file chosen');
    return importer.mutateAsync({
      body: { csv: file.text, mapping: mappingForRequest(mapping.columns), dryRun },
      headers: (dryRun ? checkKey : importKey).headers(),
    });
  };

  const check = async () => {
    if (!mapping) return;
    const absent = REQUIRED_COLUMNS.filter((c) => mapping.columns[c] === '');
    setMissing(absent);
    if (absent.length) {
      document.querySelector<HTMLSelectElement>(`select[name="${absent[0]}"]`)?.focus();
      return;
    }
    forgetCheck();
    try {
      setChecked(await send(true));
    } catch (error) {
      setFailure(failureOf(error));
    } finally {
      checkKey.settle();
    }
  };

  const confirm = async () => {
    try {
      const result = await send(false);
      importKey.settle();
      setImported(result);
      setChecked(null);
    } catch (error) {
      importKey.settle(error);
      setFailure(failureOf(error));
      // Only a lost connection leaves the checked file ready to send again (with the same key).
      if (!isApiError(error) || error.status !== 0) setChecked(null);
    }
  };

  const startOver = () => {
    setImported(null);
    setFile(null);
    forgetCheck();
  };

  const title = `Import feedings · ${name}`;
  if (imported) {
    return (
      <Page title={title} documentTitle="Import feedings">
        <Alert severity="success" role="status" data-testid="import-done">
          {importedText(imported, name)}
          {imported.feedings.duplicate > 0 &&
            ` ${imported.feedings.duplicate} already in the logbook were left as they were.`}
        </Alert>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          <Button component={RouterLink} to={`/cultures/${cultureId}`} variant="contained" size="large">
            Back to {name}
          </Button>
          <Button variant="outlined" size="large" onClick={startOver}>
            Import another file
          </Button>
        </Stack>
      </Page>
    );
  }

  return (
    <Page
      title={title}
      documentTitle="Import feedings"
      intro="From a CSV file with one row per rise check, the feeding’s columns repeated — the layout of Peakwise’s own download."
    >
      <Card component="section" aria-labelledby="file-heading">
        <CardContent sx={{ display: 'grid', gap: 2 }}>
          <Typography id="file-heading" variant="h2">
            1. Choose the file
          </Typography>
          <SiNote />
          <FilePicker
            picked={file}
            onPicked={onPicked}
            onPicking={() => {
              setFile(null);
              forgetCheck();
            }}
          />
        </CardContent>
      </Card>

      {file && mapping && (
        <Card component="section" aria-labelledby="mapping-heading">
          <CardContent sx={{ display: 'grid', gap: 2 }}>
            <Typography id="mapping-heading" variant="h2">
              2. Match the columns
            </Typography>
            <Typography color="text.secondary">
              Same names are matched for you. Choose the rest; those marked * are needed.
            </Typography>
            <ColumnMappingFields
              headers={file.headers}
              mapping={mapping.columns}
              missing={missing}
              onChange={(column, header) => {
                setMapping({ ...mapping, columns: { ...mapping.columns, [column]: header } });
                setMissing((m) => m.filter((c) => c !== column));
                forgetCheck();
              }}
            />
            <Button
              variant="contained"
              size="large"
              onClick={() => void check()}
              loading={importer.isPending && importer.variables?.body.dryRun === true}
              sx={{ minHeight: 56 }}
            >
              Check file
            </Button>
          </CardContent>
        </Card>
      )}

      <div ref={results} style={{ scrollMarginTop: 72 }}>
        {file && mapping && (checked || failure) && (
          <CheckResult
            cultureName={name}
            result={checked}
            failure={failure}
            mapping={mapping.columns}
            importing={importer.isPending && importer.variables?.body.dryRun === false}
            onConfirm={() => void confirm()}
          />
        )}
      </div>
    </Page>
  );
}
