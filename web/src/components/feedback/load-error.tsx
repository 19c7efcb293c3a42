import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { isApiError } from '@/lib/api-client';

interface LoadErrorProps {
  error: unknown;
  onRetry?: () => void;
}

/** A failed load, in words, with a way to try again. */
export function LoadError({ error, onRetry }: LoadErrorProps) {
  const message = isApiError(error) ? error.message : 'Something went wrong while loading this page.';
  return (
    <Alert
      severity="error"
      action={
        onRetry ? (
          <Button color="inherit" size="small" onClick={onRetry}>
            Try again
          </Button>
        ) : undefined
      }
    >
      {message}
    </Alert>
  );
}
