import { PHOTO_CAPTION_MAX_LENGTH, type Photo } from '@peakwise/shared';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { useDeletePhoto } from '../api/delete-photo';
import { useUpdatePhoto } from '../api/update-photo';

const failure = (e: unknown) => (isApiError(e) ? e.message : 'Something went wrong. Please try again.');

/** The owner's part of the viewer: a caption to write or clear, and a delete that asks first. */
export function PhotoEditor({ photo, what, onDeleted }: { photo: Photo; what: string; onDeleted: () => void }) {
  const [caption, setCaption] = useState(photo.caption ?? '');
  const [confirming, setConfirming] = useState(false);
  const update = useUpdatePhoto();
  const remove = useDeletePhoto();
  const trimmed = caption.trim();
  const changed = trimmed !== (photo.caption ?? '');
  const tooLong = trimmed.length > PHOTO_CAPTION_MAX_LENGTH;
  const fieldError =
    update.error && isApiError(update.error)
      ? update.error.body.details?.find((d) => d.field === 'caption')
      : undefined;

  return (
    <Stack spacing={1.5}>
      <Stack
        component="form"
        spacing={1}
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          if (!changed || tooLong) return;
          update.mutate({ photoId: photo.id, body: { caption: trimmed === '' ? null : trimmed } });
        }}
      >
        <TextField
          label="Caption"
          value={caption}
          onChange={(e) => setCaption(e.target.value)}
          multiline
          maxRows={4}
          error={tooLong || fieldError !== undefined}
          helperText={
            fieldError?.message ??
            `${trimmed.length} / ${PHOTO_CAPTION_MAX_LENGTH} characters${tooLong ? ' — too long' : ''}. E.g. ${what.startsWith('crumb') ? '“open and glossy, a little tight at the base”' : '“doubled, domed, smells of yoghurt”'}.`
          }
        />
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          <Button type="submit" variant="contained" disabled={!changed || tooLong} loading={update.isPending}>
            Save caption
          </Button>
          {update.isSuccess && !changed && (
            <Typography variant="body2" role="status" color="success.main">
              Saved.
            </Typography>
          )}
        </Stack>
        {update.isError && !fieldError && (
          <Alert severity="error" role="alert">
            {failure(update.error)}
          </Alert>
        )}
      </Stack>
      {confirming ? (
        <Alert severity="warning" role="alertdialog" aria-label={`Delete this ${what}?`}>
          <Typography variant="body2">Delete this {what}? It is removed for good, with its stored copies.</Typography>
          <Stack direction="row" spacing={1} sx={{ mt: 1 }}>
            <Button
              color="error"
              variant="contained"
              loading={remove.isPending}
              onClick={() => remove.mutate(photo.id, { onSuccess: onDeleted })}
            >
              Delete
            </Button>
            <Button color="inherit" onClick={() => setConfirming(false)} disabled={remove.isPending}>
              Keep it
            </Button>
          </Stack>
          {remove.isError && (
            <Typography variant="body2" color="error" role="alert" sx={{ mt: 1 }}>
              {failure(remove.error)}
            </Typography>
          )}
        </Alert>
      ) : (
        <Button
          color="error"
          startIcon={<DeleteOutlined />}
          onClick={() => setConfirming(true)}
          sx={{ alignSelf: 'flex-start' }}
        >
          Delete photo
        </Button>
      )}
    </Stack>
  );
}
