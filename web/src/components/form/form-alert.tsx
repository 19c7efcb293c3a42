import Alert from '@mui/material/Alert';

/** The form-level server message (e.g. "E-mail or password is incorrect."), if any. */
export function FormAlert({ message }: { message: string | undefined }) {
  if (!message) return null;
  return (
    <Alert severity="error" role="alert">
      {message}
    </Alert>
  );
}
