import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { guessLoggerMapping, type LoggerGuess, type LoggerMapping, type LoggerReading } from '@peakwise/shared';
import { useRef, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { useMutation } from '@tanstack/react-query';
import { Page } from '@/components/layout/page';
import { isApiError } from '@/lib/api-client';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { addReadings, newProgress, type AddProgress, type ReadingsTarget } from '../api/add-readings';
import { collectReadings, readFirstRows, type NumberedRow } from '../utils/read-logger-file';
import { addedText, type LoggerPlace } from '../utils/logger-words';
import { CheckSummary, type Checked } from './check-summary';
import { LoggerFilePicker } from './logger-file-picker';
import { MappingFields } from './mapping-fields';
import { PreviewRows } from './preview-rows';

interface Picked {
  file: File;
  guess: LoggerGuess;
  /** The first rows after the header, with their line in the file. */
  sample: NumberedRow[];
}

/** Where the readings go and the words around it. */
export interface LoggerImportPlace {
  place: LoggerPlace;
  target: ReadingsTarget;
  /** The readings kept: from startMs for `hours` (never after now). */
  window: { startMs: number; hours: number };
  intro: string;
  back: string;
  backLabel: string;
  /** After "N readings added.": where they show and what uses them. */
  doneTail: string;
  /** Called after every attempt (batches before a failure were stored). */
  onSettled: () => void;
}

/**
 * A kitchen logger's CSV onto a feeding or a bake: choose the file, confirm which column is
 * which, check it (the whole file is read here, nothing sent), then add the readings.
 */
export function LoggerImport({
  place,
  target,
  window: span,
  intro,
  back,
  backLabel,
  doneTail,
  onSettled,
}: LoggerImportPlace) {
  const account = useSignedInAccount();
  const adder = useMutation({
    mutationFn: ({ readings, progress }: { readings: readonly LoggerReading[]; progress: AddProgress }) =>
      addReadings(target, readings, progress),
    onSettled,
  });
  const [picked, setPicked] = useState<Picked | null>(null);
  const [mapping, setMapping] = useState<LoggerMapping | null>(null);
  const [checking, setChecking] = useState(false);
  const [checked, setChecked] = useState<Checked | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState<{ added: number; outside: number } | null>(null);
  const progress = useRef<AddProgress | null>(null);

  const forgetCheck = () => {
    setChecked(null);
    setFailure(null);
    progress.current = null;
  };

  const onFile = async (file: File) => {
    forgetCheck();
    const rows = await readFirstRows(file);
    const guess = guessLoggerMapping(
      rows.map((r) => r.cells),
      account.timeZone,
    );
    const sample = rows.slice(guess.headerRow + 1, guess.headerRow + 9);
    setPicked({ file, guess, sample });
    setMapping(
      guess.mapping ?? {
        timeColumn: 0,
        temperatureColumn: 1,
        unit: 'C',
        dateFormat: 'iso',
        timeZone: account.timeZone,
      },
    );
  };

  const check = async () => {
    if (!picked || !mapping) return;
    forgetCheck();
    setChecking(true);
    try {
      const window = { ...span, nowMs: Date.now() };
      const [collection, existing] = await Promise.all([
        collectReadings(picked.file, picked.guess.headerRow, mapping, window),
        target.existingTimes(),
      ]);
      const fresh = collection.readings.filter((r) => !existing.has(r.ms));
      setChecked({ collection, fresh, alreadyThere: collection.readings.length - fresh.length });
    } catch (error) {
      setFailure(error instanceof Error ? error.message : 'The file could not be read.');
    } finally {
      setChecking(false);
    }
  };

  const confirm = async () => {
    if (!checked) return;
    progress.current ??= newProgress(checked.fresh.length);
    try {
      const added = await adder.mutateAsync({ readings: checked.fresh, progress: progress.current });
      setDone({ added, outside: checked.collection.outside });
    } catch (error) {
      const stored = progress.current.added;
      const why = isApiError(error) ? error.message : 'The readings could not be sent.';
      setFailure(
        stored > 0
          ? `${why} ${stored} readings were added before this; the rest were not.`
          : `${why} Nothing was added.`,
      );
      // Only a lost connection may be retried with the same keys; anything else needs a new check.
      if (!isApiError(error) || error.status !== 0) setChecked(null);
    }
  };

  const title = 'Import logger file';
  if (done) {
    return (
      <Page title={title}>
        <Alert severity="success" role="status" data-testid="logger-import-done">
          {addedText(done.added, done.outside, place)} {doneTail}
        </Alert>
        <Button component={RouterLink} to={back} variant="contained" size="large" sx={{ alignSelf: 'start' }}>
          {backLabel}
        </Button>
      </Page>
    );
  }

  const header = picked && mapping ? picked.guess.headers : [];
  return (
    <Page title={title} intro={intro}>
      <Card component="section" aria-labelledby="logger-file-heading">
        <CardContent sx={{ display: 'grid', gap: 2 }}>
          <Typography id="logger-file-heading" variant="h2">
            1. Choose the file
          </Typography>
          <LoggerFilePicker picked={picked?.file ?? null} onFile={onFile} onPicking={() => setPicked(null)} />
        </CardContent>
      </Card>

      {picked && mapping && (
        <Card component="section" aria-labelledby="logger-mapping-heading">
          <CardContent sx={{ display: 'grid', gap: 2 }}>
            <Typography id="logger-mapping-heading" variant="h2">
              2. Check the columns
            </Typography>
            {!picked.guess.mapping && (
              <Alert severity="warning">No column reads as times and temperatures by itself; choose them below.</Alert>
            )}
            <MappingFields
              headers={header}
              mapping={mapping}
              accountZone={account.timeZone}
              unitHint={
                picked.guess.unitFrom === 'header' ? 'Named in the column’s header.' : 'Guessed from the values.'
              }
              zoneHint={picked.guess.zoneFromHeader ? 'The header says UTC.' : 'Times with an offset keep their own.'}
              onChange={(next) => {
                setMapping(next);
                forgetCheck();
              }}
            />
            <PreviewRows
              rows={picked.sample}
              mapping={mapping}
              timeZone={account.timeZone}
              unit={account.temperatureUnit}
            />
            <Button
              variant="contained"
              size="large"
              onClick={() => void check()}
              loading={checking}
              sx={{ minHeight: 56 }}
            >
              Check file
            </Button>
          </CardContent>
        </Card>
      )}

      {failure && (
        <Alert severity="error" role="alert">
          {failure}
        </Alert>
      )}
      {checked && (
        <CheckSummary
          checked={checked}
          place={place}
          adding={adder.isPending}
          onConfirm={() => void confirm()}
          back={back}
        />
      )}
    </Page>
  );
}
