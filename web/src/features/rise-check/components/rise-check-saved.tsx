import type { RiseCheck } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { PhotoUploader } from '@/features/photos/components/photo-uploader';

/**
 * After a rise check is saved: the jar as it stands now is the best picture of this rise, so the
 * camera is offered right here; "See the curve" goes on either way.
 */
export function RiseCheckSaved({ check, cultureHref }: { check: RiseCheck; cultureHref: string }) {
  return (
    <Card component="section" aria-labelledby="rise-saved-heading" data-testid="rise-check-saved">
      <CardContent>
        <Stack spacing={2}>
          <Alert severity="success" role="status">
            Rise check saved.
          </Alert>
          <Typography id="rise-saved-heading" variant="h2">
            A photo of the jar?
          </Typography>
          <Typography color="text.secondary">
            It goes with this rise check and shows on the culture’s photo strip beside the curve.
          </Typography>
          <PhotoUploader
            target={{ type: 'rise-check', id: check.id }}
            what="Side on, from the same spot as before, so the rise reads against the other photos."
          />
          <Button component={RouterLink} to={cultureHref} variant="contained" size="large" sx={{ alignSelf: 'start' }}>
            See the curve
          </Button>
        </Stack>
      </CardContent>
    </Card>
  );
}
