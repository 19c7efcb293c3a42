import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { usePhotos } from '../api/get-photos';
import { clockStyle, formatPhotoClock, formatPhotoDay, formatPhotoTime, shownAt } from '../utils/photo-words';
import { PhotoThumb } from './photo-thumb';
import { PhotoUploader } from './photo-uploader';
import { PhotoViewer } from './photo-viewer';

interface PhotosCardProps {
  /** A feeding's jar photos or a bake's crumb photos. */
  subject: { type: 'feeding' | 'bake-plan'; id: string };
  /** Someone else's log (an instructor's view): photos to look at, nothing to add or change. */
  readOnly?: boolean;
}

const WORDS = {
  feeding: {
    title: 'Jar photos',
    hint: 'Photograph the jar from the same spot each time; a band at the starting level makes the rise easy to read.',
    empty: 'No jar photos of this feeding yet.',
  },
  'bake-plan': {
    title: 'Crumb photos',
    hint: 'Slice once the loaf has cooled (an hour or more), so the crumb has set and shows true.',
    empty: 'No crumb photos of this bake yet.',
  },
} as const;

/** The photos of one feeding or bake: add from the camera or gallery, thumbnails, the viewer. */
export function PhotosCard({ subject, readOnly = false }: PhotosCardProps) {
  const account = useSignedInAccount();
  const headingId = useId();
  const photos = usePhotos(subject);
  const [open, setOpen] = useState<number | null>(null);
  const words = WORDS[subject.type];
  const style = clockStyle(account.unitSystem);
  const when = (iso: string) => formatPhotoTime(iso, account.timeZone, style);
  const items = photos.data?.items ?? [];

  return (
    <Card component="section" aria-labelledby={headingId} data-testid="photos-card">
      <CardContent>
        <Stack spacing={2}>
          <Typography id={headingId} variant="h2">
            {words.title}
          </Typography>
          {!readOnly && <PhotoUploader target={subject} what={words.hint} />}
          {photos.isPending && <Skeleton variant="rounded" height={96} />}
          {photos.isError && <LoadError error={photos.error} onRetry={() => void photos.refetch()} />}
          {photos.isSuccess && items.length === 0 && <Typography color="text.secondary">{words.empty}</Typography>}
          {items.length > 0 && (
            <Box
              component="ul"
              aria-label={words.title}
              sx={{
                display: 'grid',
                gridTemplateColumns: 'repeat(auto-fill, minmax(104px, 1fr))',
                gap: 1.5,
                listStyle: 'none',
                p: 0,
                m: 0,
              }}
            >
              {items.map((photo, i) => (
                <Box component="li" key={photo.id} sx={{ minWidth: 0 }}>
                  <PhotoThumb photo={photo} when={when(shownAt(photo))} onOpen={() => setOpen(i)} />
                  <Typography variant="caption" color="text.secondary" component="p" noWrap sx={{ mt: 0.5 }}>
                    {photo.caption ??
                      `${formatPhotoDay(shownAt(photo), account.timeZone)} · ${formatPhotoClock(shownAt(photo), account.timeZone, style)}`}
                  </Typography>
                </Box>
              ))}
            </Box>
          )}
        </Stack>
      </CardContent>
      <PhotoViewer photos={items} index={open} onIndexChange={setOpen} when={when} readOnly={readOnly} />
    </Card>
  );
}
