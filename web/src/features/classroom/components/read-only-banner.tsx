import VisibilityOutlined from '@mui/icons-material/VisibilityOutlined';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';

interface ReadOnlyBannerProps {
  classId: string;
  className: string | null;
  studentName: string | null;
}

/** Says at the top whose log this is and that it cannot be changed from here. */
export function ReadOnlyBanner({ classId, className, studentName }: ReadOnlyBannerProps) {
  return (
    <Alert severity="info" icon={<VisibilityOutlined />} data-testid="read-only-banner">
      <strong>Read-only: shared with you as this class’s instructor.</strong>{' '}
      {studentName ? `${studentName} keeps this log; ` : 'The student keeps this log; '}
      you can read it and comment on feedings and bakes.{' '}
      <Link component={RouterLink} to={`/classes/${classId}`}>
        Back to {className ?? 'the class'}
      </Link>
    </Alert>
  );
}
