import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/brand/wordmark';

interface AuthLayoutProps {
  title: string;
  subtitle: string;
  children: ReactNode;
  /** The way to the other form ("New to Peakwise? Create an account"). */
  footer: ReactNode;
}

/** Sign-in and sign-up: one centred card, full-width on a phone. */
export function AuthLayout({ title, subtitle, children, footer }: AuthLayoutProps) {
  return (
    <Box
      component="main"
      sx={{
        minHeight: '100dvh',
        display: 'flex',
        flexDirection: 'column',
        alignItems: 'center',
        px: 2,
        py: { xs: 4, sm: 8 },
        gap: 3,
      }}
    >
      <Box sx={{ color: 'primary.main' }}>
        <Wordmark />
      </Box>
      <Card sx={{ width: '100%', maxWidth: 440 }}>
        <CardContent sx={{ p: { xs: 2.5, sm: 4 }, display: 'grid', gap: 3 }}>
          <Box>
            <Typography variant="h1" gutterBottom>
              {title}
            </Typography>
            <Typography color="text.secondary">{subtitle}</Typography>
          </Box>
          {children}
        </CardContent>
      </Card>
      <Typography color="text.secondary" sx={{ textAlign: 'center' }}>
        {footer}
      </Typography>
    </Box>
  );
}
