import type { ClassJoinPreview } from '@peakwise/shared';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlineOutlined';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { classDates } from '../utils/join-words';

/** The class as its invitation or code shows it, and exactly what joining shares; then `actions`. */
export function JoinPreview({ preview, actions }: { preview: ClassJoinPreview; actions: ReactNode }) {
  const sharesId = useId();
  return (
    <Card component="section" aria-label={`Class ${preview.name}`} data-testid="join-preview">
      <CardContent>
        <Stack spacing={2}>
          <Box>
            <Typography variant="h2">{preview.name}</Typography>
            <Typography color="text.secondary">
              {classDates(preview.startsOn, preview.endsOn)} · taught by {preview.instructorName}
            </Typography>
          </Box>
          {preview.description && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{preview.description}</Typography>}
          <Box>
            <Typography variant="h3" component="h3" id={sharesId} gutterBottom>
              What joining shares
            </Typography>
            <List dense disablePadding aria-labelledby={sharesId}>
              {preview.shares.map((s) => (
                <ListItem key={s} disableGutters sx={{ alignItems: 'flex-start' }}>
                  <ListItemIcon sx={{ minWidth: 32, mt: 0.5 }}>
                    <CheckCircleOutline fontSize="small" color="primary" />
                  </ListItemIcon>
                  <ListItemText primary={s} />
                </ListItem>
              ))}
            </List>
          </Box>
          {actions}
        </Stack>
      </CardContent>
    </Card>
  );
}
