import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router-dom';

/** After joining (or finding oneself already in): what happens now, and where to go. */
export function JoinedNotice({
  name,
  instructorName,
  already,
}: {
  name: string;
  instructorName: string;
  already: boolean;
}) {
  return (
    <Stack spacing={2}>
      <Alert severity="success" role="status">
        {already ? `You are already a student in ${name}.` : `You joined ${name}.`} {instructorName} can read your
        cultures’ logs and bakes and leave comments on them; you’ll get an alert when they do.
      </Alert>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
        <Button component={RouterLink} to="/shelf" variant="contained">
          Go to your shelf
        </Button>
        <Button component={RouterLink} to="/classes" variant="outlined">
          Your classes
        </Button>
      </Stack>
    </Stack>
  );
}
