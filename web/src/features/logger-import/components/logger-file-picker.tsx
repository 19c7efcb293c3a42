import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { LOGGER_FILE_MAX_BYTES } from '@peakwise/shared';
import { useState, type ChangeEvent } from 'react';
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

  const onChange = async (event: ChangeEvent<HTMLInputElement>) => {
    const input = event.currentTarget;
    const file = input.files?.[0];
    // Cleared, so choosing the same (now corrected) file again is noticed.
    input.value = '';
    if (!file) return;
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
      <Button
        component="label"
        role={undefined}
        tabIndex={-1}
        variant={picked ? 'outlined' : 'contained'}
        size="large"
        startIcon={<UploadFileOutlined />}
        sx={{
          minHeight: 56,
          alignSelf: { xs: 'stretch', sm: 'start' },
          '&:has(input:focus-visible)': { outline: 3, outlineOffset: 2, outlineColor: 'secondary.main' },
        }}
      >
        {picked ? 'Choose another file' : 'Choose a CSV file'}
        <Box
          component="input"
          type="file"
          accept=".csv,.txt,text/csv,text/plain,application/vnd.ms-excel"
          data-testid="logger-file"
          onChange={(e: ChangeEvent<HTMLInputElement>) => void onChange(e)}
          sx={{
            position: 'absolute',
            width: '1px',
            height: '1px',
            opacity: 0,
            overflow: 'hidden',
            clip: 'rect(0 0 0 0)',
          }}
        />
      </Button>
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
