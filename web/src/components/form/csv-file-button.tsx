import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import type { ChangeEvent } from 'react';

interface CsvFileButtonProps {
  /** A file is chosen already: the button offers another, in a quieter style. */
  chosen: boolean;
  accept: string;
  testId: string;
  onFile: (file: File) => void;
}

/**
 * "Choose a CSV file": a label around a visually hidden file input, so a tap opens the phone's file
 * chooser and the input stays focusable for keyboards. The input is cleared after each choice, so
 * choosing the same (now corrected) file again is noticed.
 */
export function CsvFileButton({ chosen, accept, testId, onFile }: CsvFileButtonProps) {
  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const input = event.currentTarget;
    const file = input.files?.[0];
    input.value = '';
    if (file) onFile(file);
  };
  return (
    <Button
      component="label"
      role={undefined}
      tabIndex={-1}
      variant={chosen ? 'outlined' : 'contained'}
      size="large"
      startIcon={<UploadFileOutlined />}
      sx={{
        minHeight: 56,
        alignSelf: { xs: 'stretch', sm: 'start' },
        '&:has(input:focus-visible)': { outline: 3, outlineOffset: 2, outlineColor: 'secondary.main' },
      }}
    >
      {chosen ? 'Choose another file' : 'Choose a CSV file'}
      <Box
        component="input"
        type="file"
        accept={accept}
        data-testid={testId}
        onChange={onChange}
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
  );
}
