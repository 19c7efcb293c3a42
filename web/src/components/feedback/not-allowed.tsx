import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { Page } from '@/components/layout/page';

/** A signed-in page this person's role doesn't open. The API refuses the data as well. */
export function NotAllowed({ what }: { what: string }) {
  return (
    <Page title="Not available" intro={`${what} If you think you need access, ask a Peakwise admin.`}>
      <div>
        <Button component={RouterLink} to="/" variant="contained">
          Go to Home
        </Button>
      </div>
    </Page>
  );
}
