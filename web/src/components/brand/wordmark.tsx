import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { BrandMark } from './brand-mark';

/** Glyph + name. `onDark` for the slate app bar, where the glyph sits on a light disc. */
export function Wordmark({ onDark = false }: { onDark?: boolean }) {
  return (
    <Box sx={{ display: 'inline-flex', alignItems: 'center', gap: 1 }}>
      <Box
        sx={{
          display: 'grid',
          placeItems: 'center',
          width: 34,
          height: 34,
          borderRadius: '50%',
          bgcolor: onDark ? 'background.default' : 'transparent',
        }}
      >
        <BrandMark sx={{ fontSize: 26 }} aria-hidden />
      </Box>
      <Typography
        component="span"
        sx={{ fontSize: '1.25rem', fontWeight: 500, letterSpacing: '0.01em', color: 'inherit' }}
      >
        Peakwise
      </Typography>
    </Box>
  );
}
