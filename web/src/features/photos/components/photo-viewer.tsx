import type { Photo } from '@peakwise/shared';
import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import CloseOutlined from '@mui/icons-material/CloseOutlined';
import Box from '@mui/material/Box';
import Dialog from '@mui/material/Dialog';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import IconButton from '@mui/material/IconButton';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { imageSrc, photoAlt } from '../utils/photo-words';
import { PhotoEditor } from './photo-editor';

export interface PhotoViewerProps {
  photos: readonly Photo[];
  /** Index of the photo shown; null keeps the viewer closed. */
  index: number | null;
  onIndexChange: (index: number | null) => void;
  /** "Tue 1 Dec, 14:05" in the viewer's zone and clock. */
  when: (iso: string) => string;
  /** Where its feeding's page is, when it should be linked ("From the feeding of …"). */
  feedingLink?: (photo: Photo) => { href: string; label: string } | null;
  /** The instructor's view: caption shown, not edited; no delete. */
  readOnly?: boolean;
}

/** One photo at display size, with its caption, its feeding, and (for the owner) edit and delete. */
export function PhotoViewer({ photos, index, onIndexChange, when, feedingLink, readOnly }: PhotoViewerProps) {
  const titleId = useId();
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const photo = index === null ? undefined : photos[index];
  const close = () => onIndexChange(null);
  const step = (by: number) => index !== null && onIndexChange((index + by + photos.length) % photos.length);
  const link = photo && feedingLink?.(photo);
  const what = photo?.subjectType === 'bake-plan' ? 'Crumb photo' : 'Jar photo';

  return (
    <Dialog
      open={photo !== undefined}
      onClose={close}
      fullScreen={phone}
      fullWidth
      maxWidth="md"
      aria-labelledby={titleId}
      onKeyDown={(e) => {
        if (photos.length < 2 || (e.target as HTMLElement).tagName === 'INPUT') return;
        if (e.key === 'ArrowLeft') step(-1);
        if (e.key === 'ArrowRight') step(1);
      }}
    >
      {photo && (
        <>
          <DialogTitle id={titleId} sx={{ pr: 7 }}>
            {what}
            <Typography variant="body2" color="text.secondary">
              {photo.takenAt ? `Taken ${when(photo.takenAt)}` : `Added ${when(photo.createdAt)}`}
              {photos.length > 1 && ` · ${index! + 1} of ${photos.length}`}
            </Typography>
            <IconButton onClick={close} aria-label="Close" sx={{ position: 'absolute', right: 8, top: 8 }}>
              <CloseOutlined />
            </IconButton>
          </DialogTitle>
          <DialogContent>
            <Stack spacing={2}>
              <Box sx={{ position: 'relative', bgcolor: 'grey.100', borderRadius: 2, overflow: 'hidden' }}>
                <Box
                  component="img"
                  src={imageSrc(photo.displayUrl)}
                  alt={photoAlt(photo, when(photo.takenAt ?? photo.createdAt))}
                  width={photo.width}
                  height={photo.height}
                  sx={{
                    display: 'block',
                    width: '100%',
                    height: 'auto',
                    maxHeight: phone ? '60vh' : '65vh',
                    objectFit: 'contain',
                  }}
                />
                {photos.length > 1 && (
                  <>
                    <IconButton
                      onClick={() => step(-1)}
                      aria-label="Previous photo"
                      sx={{
                        position: 'absolute',
                        left: 8,
                        top: '50%',
                        transform: 'translateY(-50%)',
                        bgcolor: 'rgba(255,255,255,0.85)',
                        '&:hover': { bgcolor: '#fff' },
                      }}
                    >
                      <ChevronLeft />
                    </IconButton>
                    <IconButton
                      onClick={() => step(1)}
                      aria-label="Next photo"
                      sx={{
                        position: 'absolute',
                        right: 8,
                        top: '50%',
                        transform: 'translateY(-50%)',
                        bgcolor: 'rgba(255,255,255,0.85)',
                        '&:hover': { bgcolor: '#fff' },
                      }}
                    >
                      <ChevronRight />
                    </IconButton>
                  </>
                )}
              </Box>
              {link && (
                <Typography variant="body2">
                  From the{' '}
                  <Link component={RouterLink} to={link.href}>
                    {link.label}
                  </Link>
                  .
                </Typography>
              )}
              {readOnly ? (
                photo.caption && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{photo.caption}</Typography>
              ) : (
                <PhotoEditor key={photo.id} photo={photo} what={what.toLowerCase()} onDeleted={close} />
              )}
            </Stack>
          </DialogContent>
        </>
      )}
    </Dialog>
  );
}
