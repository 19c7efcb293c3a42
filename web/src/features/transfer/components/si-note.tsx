import Typography from '@mui/material/Typography';

/** Files stay SI whatever units the baker picked, so a file reads the same on every account. */
export function SiNote() {
  return (
    <Typography variant="body2" color="text.secondary" data-testid="si-note">
      Files are in SI units: grams (g), millimetres (mm) and degrees Celsius (°C), whichever units you use in Peakwise.
    </Typography>
  );
}
