import { createTheme } from '@mui/material/styles';

// Peakwise's own palette. Contrast (WCAG 2.x) measured against the cream paper background:
// slate 9.0:1, ink 13.7:1, muted ink 5.4:1. The amber accent is too light for white text (3.1:1),
// so anything filled with it carries dark ink (5.5:1); amber *text* uses the darker crust (5.8:1).
const slate = '#2F4858';
const amber = '#C9832E';
const crust = '#8A5518';
const cream = '#FBF7F0';
const ink = '#1F2A30';
const mutedInk = '#5B6770';

export const theme = createTheme({
  palette: {
    primary: { main: slate, contrastText: '#FFFFFF' },
    secondary: { main: amber, dark: crust, contrastText: '#1F1B16' },
    background: { default: cream, paper: '#FFFFFF' },
    text: { primary: ink, secondary: mutedInk },
    divider: 'rgba(47, 72, 88, 0.14)',
  },
  typography: {
    fontFamily: 'Roboto, system-ui, sans-serif',
    h1: { fontSize: '1.75rem', fontWeight: 500, lineHeight: 1.25 },
    h2: { fontSize: '1.375rem', fontWeight: 500, lineHeight: 1.3 },
    h3: { fontSize: '1.125rem', fontWeight: 500, lineHeight: 1.35 },
    // Sentence case reads friendlier than shouting capitals on every button.
    button: { textTransform: 'none', fontWeight: 500 },
  },
  shape: { borderRadius: 12 },
  components: {
    MuiCard: {
      defaultProps: { variant: 'outlined' },
    },
    MuiTextField: {
      defaultProps: { fullWidth: true },
    },
    MuiButton: {
      // Big enough to hit with a floury thumb.
      styleOverrides: { sizeLarge: { minHeight: 48 } },
    },
  },
});
