import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { REQUEST_BODY_MAX_BYTES } from '@peakwise/shared';
import { useState } from 'react';
import { CsvFileButton } from '@/components/form/csv-file-button';
import { readHeaders } from '../utils/csv-header';
import { requestBytes, SIZE_LIMIT_TEXT, sizeText } from '../utils/import-words';

export interface PickedFile {
  name: string;
  size: number;
  text: string;
  headers: string[];
}

/** Reads the baker's file in the browser and refuses, in words, what the server would refuse unread. */
async function readPicked(file: File): Promise<PickedFile> {
  if (file.size > REQUEST_BODY_MAX_BYTES) {
    throw new Error(
      `“${file.name}” is ${sizeText(file.size, 'up')}, over the ${SIZE_LIMIT_TEXT} Peakwise takes at once. ` +
        'Split it by date into smaller files and import them one after another.',
    );
  }
  const text = await file.text();
  const headers = readHeaders(text);
  if (headers.filter(Boolean).length === 0) {
    throw new Error(`“${file.name}” has no header row. The first line should name the columns.`);
  }
  // The file travels inside a JSON request, where quotes and line breaks take two bytes each.
  if (requestBytes({ csv: text, dryRun: true }) > REQUEST_BODY_MAX_BYTES) {
    throw new Error(
      `“${file.name}” is just under ${SIZE_LIMIT_TEXT}, but too large once sent. ` +
        'Split it by date into smaller files and import them one after another.',
    );
  }
  return { name: file.name, size: file.size, text, headers };
}

interface FilePickerProps {
  picked: PickedFile | null;
  onPicked: (file: PickedFile) => void;
  /** Called when a new choice starts, so an old check no longer counts. */
  onPicking: () => void;
}

export function FilePicker({ picked, onPicked, onPicking }: FilePickerProps) {
  const [error, setError] = useState<string | null>(null);

  const onFile = async (file: File) => {
    onPicking();
    setError(null);
    try {
      onPicked(await readPicked(file));
    } catch (e) {
      setError(e instanceof Error ? e.message : 'This file could not be read.');
    }
  };

  return (
    <Stack spacing={1.5}>
      <CsvFileButton
        chosen={picked !== null}
        accept=".csv,text/csv,text/comma-separated-values,application/vnd.ms-excel,text/plain"
        testId="csv-file"
        onFile={(file) => void onFile(file)}
      />
      {picked && !error && (
        <Typography role="status">
          <strong>{picked.name}</strong> · {sizeText(picked.size)} · {picked.headers.length} columns
        </Typography>
      )}
      {error && (
        <Alert severity="error" role="alert">
          {error}
        </Alert>
      )}
      <Typography variant="body2" color="text.secondary">
        Up to {SIZE_LIMIT_TEXT}, the first line naming the columns. Nothing is imported until you confirm.
      </Typography>
    </Stack>
  );
}
