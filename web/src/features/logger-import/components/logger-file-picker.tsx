import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { LOGGER_FILE_MAX_BYTES } from '@peakwise/shared';
import { useState } from 'react';
import { CsvFileButton } from '@/components/form/csv-file-button';
import { fileSizeText } from '../utils/logger-words';

interface LoggerFilePickerProps {
  picked: File | null;
  /** Reads the start of the file; a rejection is shown here in words. */
  onFile: (file: File) => Promise<void>;
  onPicking: () => void;
}

const LIMIT = fileSizeText(LOGGER_FILE_MAX_BYTES);

/** The file chooser, with the size limit checked before anything is read. */
export function LoggerFilePicker({ picked, onFile, onPicking }: LoggerFilePickerProps) {
  const [error, setError] = useState<string | null>(null);

  const onChosen = async (file: File) => {
    onPicking();
    setError(null);
    if (file.size > LOGGER_FILE_MAX_BYTES) {
      setError(
        `“${file.name}” is ${fileSizeText(file.size)}, over the ${LIMIT} Peakwise reads. Export a shorter stretch of time.`,
      );
      return;
    }
    try {
      await onFile(file);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'This file could not be read.');
    }
  };

  return (
    <Stack spacing={1.5}>
      <CsvFileButton
        chosen={picked !== null}
        accept=".csv,.txt,text/csv,text/plain,application/vnd.ms-excel"
        testId="logger-file"
        onFile={(file) => void onChosen(file)}
      />
      {picked && !error && (
        <Typography role="status">
          <strong>{picked.name}</strong> · {fileSizeText(picked.size)}
        </Typography>
      )}
      {error && (
        <Alert severity="error" role="alert">
          {error}
        </Alert>
      )}
      <Typography variant="body2" color="text.secondary">
        Up to {LIMIT}; °C or °F. Nothing is added until you confirm.
      </Typography>
    </Stack>
  );
}
