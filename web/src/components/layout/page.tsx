import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface PageProps {
  /** The page's heading. */
  title: string;
  /** The tab title, when it should differ from the heading (e.g. a greeting). */
  documentTitle?: string;
  intro?: ReactNode;
  children: ReactNode;
}

/** One page inside the shell: its heading, a line saying what it is for, then its content. */
export function Page({ title, documentTitle, intro, children }: PageProps) {
  return (
    <>
      {/* React 19 hoists <title> into <head>. */}
      <title>{`${documentTitle ?? title} · Peakwise`}</title>
      <Stack spacing={3}>
        <Box>
          <Typography variant="h1">{title}</Typography>
          {intro && (
            <Typography color="text.secondary" sx={{ mt: 1 }}>
              {intro}
            </Typography>
          )}
        </Box>
        {children}
      </Stack>
    </>
  );
}
