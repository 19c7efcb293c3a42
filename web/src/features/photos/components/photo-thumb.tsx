import type { Photo } from '@peakwise/shared';
import Box from '@mui/material/Box';
import ButtonBase from '@mui/material/ButtonBase';
import { imageSrc, photoAlt } from '../utils/photo-words';

/** A square thumbnail that opens the viewer; the label under it is the caller's (a time, a day). */
export function PhotoThumb({
  photo,
  size,
  when,
  onOpen,
}: {
  photo: Photo;
  /** Edge in px; undefined fills the grid cell. */
  size?: number;
  when: string;
  onOpen: () => void;
}) {
  return (
    <ButtonBase
      onClick={onOpen}
      aria-label={`Open ${photoAlt(photo, when)}`}
      data-testid="photo-thumb"
      sx={{
        display: 'block',
        width: size ?? '100%',
        aspectRatio: '1 / 1',
        borderRadius: 2,
        overflow: 'hidden',
        bgcolor: 'grey.100',
        border: 1,
        borderColor: 'divider',
        flexShrink: 0,
        '&:focus-visible': { outline: '3px solid', outlineColor: 'secondary.main', outlineOffset: 2 },
      }}
    >
      <Box
        component="img"
        src={imageSrc(photo.thumbnailUrl)}
        alt=""
        loading="lazy"
        sx={{ display: 'block', width: '100%', height: '100%', objectFit: 'cover' }}
      />
    </ButtonBase>
  );
}
