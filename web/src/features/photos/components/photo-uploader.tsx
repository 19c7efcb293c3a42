import { PHOTO_ACCEPTED_TYPES, PHOTOS_MAX_PER_REQUEST } from '@peakwise/shared';
import CameraAltOutlined from '@mui/icons-material/CameraAltOutlined';
import PhotoLibraryOutlined from '@mui/icons-material/PhotoLibraryOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ChangeEvent } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';
import { usePhotoUploads } from '../api/upload-photos';
import type { PhotoTarget } from '../api/query-keys';
import { MAX_SIZE_WORDS } from '../utils/photo-checks';
import { isBusy, summary } from '../utils/upload-state';
import { UploadRow } from './upload-row';

const ACCEPT = PHOTO_ACCEPTED_TYPES.join(',');

/**
 * "Take photo" opens the phone's camera (capture), "Choose photos" its gallery (several at once).
 * Each file goes up on its own with its own progress bar and, if refused, its own reason.
 */
export function PhotoUploader({ target, what }: { target: PhotoTarget; what: string }) {
  const uploads = usePhotoUploads(target);
  const pick = (event: ChangeEvent<HTMLInputElement>) => {
    const files = Array.from(event.target.files ?? []);
    // Cleared so picking the same file again (after a failure) fires another change.
    event.target.value = '';
    if (files.length > 0) uploads.add(files);
  };
  const status = summary(uploads.items);

  return (
    <Stack spacing={1.5}>
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        <Button
          component="label"
          variant="contained"
          size="large"
          startIcon={<CameraAltOutlined />}
          sx={{ flex: { xs: '1 1 auto', sm: '0 0 auto' }, whiteSpace: 'nowrap' }}
        >
          Take photo
          <VisuallyHidden>
            <input type="file" accept={ACCEPT} capture="environment" onChange={pick} data-testid="photo-camera" />
          </VisuallyHidden>
        </Button>
        <Button
          component="label"
          variant="outlined"
          size="large"
          startIcon={<PhotoLibraryOutlined />}
          sx={{ flex: { xs: '1 1 auto', sm: '0 0 auto' }, whiteSpace: 'nowrap' }}
        >
          Choose photos
          <VisuallyHidden>
            <input type="file" accept={ACCEPT} multiple onChange={pick} data-testid="photo-files" />
          </VisuallyHidden>
        </Button>
      </Stack>
      <Typography variant="body2" color="text.secondary">
        {what}
        <br />
        JPEG, PNG or WebP, up to {MAX_SIZE_WORDS} each, {PHOTOS_MAX_PER_REQUEST} at a time. Location data is removed
        from every photo.
      </Typography>
      {uploads.pickProblem && (
        <Alert severity="warning" role="alert">
          {uploads.pickProblem}
        </Alert>
      )}
      {uploads.items.length > 0 && (
        <Stack component="ul" spacing={1} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Photos being added">
          {uploads.items.map((item) => (
            <UploadRow
              key={item.key}
              item={item}
              onRetry={() => uploads.retry(item.key)}
              onDismiss={() => uploads.dismiss(item.key)}
            />
          ))}
        </Stack>
      )}
      <Typography variant="body2" role="status" aria-live="polite" sx={{ minHeight: status ? undefined : 0 }}>
        {status && !isBusy(uploads.items) ? status : ''}
      </Typography>
    </Stack>
  );
}
